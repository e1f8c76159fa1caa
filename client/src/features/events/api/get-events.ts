import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventFilters, EventSummary } from '../../../../../shared/api/events';
import { api } from '../../../lib/api';
import { queryString } from '../../../lib/query-string';
import { eventKeys } from './keys';
import { publicListFrom } from '../../../../../shared/booking/list-window';

/** Published sessions from a day back (today's stay listed while they run), from the hour. */
const getEvents = (f: EventFilters) =>
  api<EventSummary[]>('GET', `/api/events${queryString({ ...f, from: publicListFrom(Date.now()) })}`);

export const eventsQuery = (f: EventFilters) =>
  queryOptions({ queryKey: eventKeys.list(f), queryFn: () => getEvents(f) });

export const useEvents = (f: EventFilters) => useQuery(eventsQuery(f));
