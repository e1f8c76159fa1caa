import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { LiveView } from './types';

export const getLiveView = (eventId: number) => api<LiveView>('GET', `/api/events/${eventId}/live`);

export const liveViewQuery = (eventId: number) =>
  queryOptions({
    queryKey: eventDayKeys.live(eventId),
    queryFn: () => getLiveView(eventId),
    refetchInterval: 15_000,
    staleTime: 0,
  });

export const useLiveView = (eventId: number) => useQuery(liveViewQuery(eventId));
