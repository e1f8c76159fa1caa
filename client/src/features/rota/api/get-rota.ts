import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Rota } from './types';
import { api } from '../../../lib/api';
import { rotaKeys } from './keys';

export const getRota = (eventId: number) => api<Rota>('GET', `/api/events/${eventId}/rota`);

export const rotaQuery = (eventId: number) =>
  queryOptions({ queryKey: rotaKeys.event(eventId), queryFn: () => getRota(eventId) });

export const useRota = (eventId: number) => useQuery(rotaQuery(eventId));
