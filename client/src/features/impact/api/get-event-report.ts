import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventReport } from './types';
import { api } from '../../../lib/api';

import { impactKeys } from './keys';

export const getEventReport = (eventId: number) => api<EventReport>('GET', `/api/events/${eventId}/report`);

export const eventReportQuery = (eventId: number) =>
  queryOptions({ queryKey: impactKeys.eventReport(eventId), queryFn: () => getEventReport(eventId) });

export const useEventReport = (eventId: number) => useQuery(eventReportQuery(eventId));
