import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { EventReport } from './types';
import { api } from '../../../lib/api';

import { impactKeys } from './keys';

export const getEventReport = (eventId: number) => api<EventReport>('GET', `/api/events/${eventId}/report`);

export const eventReportQuery = (eventId: number) =>
  queryOptions({ queryKey: impactKeys.eventReport(eventId), queryFn: () => getEventReport(eventId) });

/** Read after the route's loader has the report, so the page renders with it from the start. */
export const useEventReport = (eventId: number) => useSuspenseQuery(eventReportQuery(eventId));
