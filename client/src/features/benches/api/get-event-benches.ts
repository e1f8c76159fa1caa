import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Bench } from '../../../../../shared/api/benches';
import { api } from '../../../lib/api';
import { benchKeys } from './keys';

export const getEventBenches = (eventId: number) => api<Bench[]>('GET', `/api/events/${eventId}/benches`);

export const eventBenchesQuery = (eventId: number) =>
  queryOptions({ queryKey: benchKeys.event(eventId), queryFn: () => getEventBenches(eventId) });

export const useEventBenches = (eventId: number) => useQuery(eventBenchesQuery(eventId));
