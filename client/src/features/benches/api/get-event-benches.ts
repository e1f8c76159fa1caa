import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { Bench } from '../../../../../shared/api/benches';
import { api } from '../../../lib/api';
import { benchKeys } from './keys';

export const getEventBenches = (eventId: number) => api<Bench[]>('GET', `/api/events/${eventId}/benches`);

export const eventBenchesQuery = (eventId: number) =>
  queryOptions({ queryKey: benchKeys.event(eventId), queryFn: () => getEventBenches(eventId) });

/** Read after the route's loader has the benches, so the page renders with them from the start. */
export const useEventBenches = (eventId: number) => useSuspenseQuery(eventBenchesQuery(eventId));
