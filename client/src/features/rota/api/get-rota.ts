import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { Rota } from './types';
import { api } from '../../../lib/api';
import { rotaKeys } from './keys';

export const getRota = (eventId: number) => api<Rota>('GET', `/api/events/${eventId}/rota`);

export const rotaQuery = (eventId: number) =>
  queryOptions({ queryKey: rotaKeys.event(eventId), queryFn: () => getRota(eventId) });

/** Read after the route's loader has the rota, so the page renders with it from the start. */
export const useRota = (eventId: number) => useSuspenseQuery(rotaQuery(eventId));
