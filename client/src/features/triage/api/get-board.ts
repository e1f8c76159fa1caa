import { queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { Board } from './types';
import { api } from '../../../lib/api';
import { triageKeys } from './keys';

export const getBoard = (eventId: number) => api<Board>('GET', `/api/events/${eventId}/board`);

export const boardQuery = (eventId: number) =>
  queryOptions({ queryKey: triageKeys.board(eventId), queryFn: () => getBoard(eventId) });

export const useBoard = (eventId: number) => useQuery(boardQuery(eventId));

/** For pages whose changes move items on the board (benches, seats): call it after the change. */
export function useRefreshBoard(eventId: number) {
  const qc = useQueryClient();
  return useCallback(() => void qc.invalidateQueries({ queryKey: triageKeys.board(eventId) }), [qc, eventId]);
}
