import { queryOptions, useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { Board } from './types';
import { api } from '../../../lib/api';
import { triageKeys } from './keys';

export const getBoard = (eventId: number) => api<Board>('GET', `/api/events/${eventId}/board`);

export const boardQuery = (eventId: number) =>
  queryOptions({ queryKey: triageKeys.board(eventId), queryFn: () => getBoard(eventId) });

/** Read after the route's loader has the board, so the page renders with it from the start. */
export const useBoard = (eventId: number) => useSuspenseQuery(boardQuery(eventId));

/** For pages whose changes move items on the board (benches, seats): call it after the change. */
export function useRefreshBoard(eventId: number) {
  const qc = useQueryClient();
  return useCallback(() => void qc.invalidateQueries({ queryKey: triageKeys.board(eventId) }), [qc, eventId]);
}
