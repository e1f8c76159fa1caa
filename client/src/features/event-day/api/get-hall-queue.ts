import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { HallQueue } from './types';

export const getHallQueue = (eventId: number) => api<HallQueue>('GET', `/api/public/events/${eventId}/queue`);

/** The TV refreshes by itself every 10 seconds and keeps showing the last answer while the network is away. */
export const hallQueueQuery = (eventId: number) =>
  queryOptions({
    queryKey: eventDayKeys.hall(eventId),
    queryFn: () => getHallQueue(eventId),
    refetchInterval: 10_000,
    staleTime: 0,
  });

export const useHallQueue = (eventId: number) => useQuery(hallQueueQuery(eventId));
