import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { EventReport } from './types';
import { api } from '../../../lib/api';
import { queryString } from '../../../lib/query-string';
import { impactKeys } from './keys';

export const getGroupReport = (groupId: number, from?: string, to?: string) =>
  api<EventReport>('GET', `/api/groups/${groupId}/report${queryString({ from, to })}`);

export const groupReportQuery = (groupId: number, from?: string, to?: string) =>
  queryOptions({
    queryKey: impactKeys.groupReport(groupId, from, to),
    queryFn: () => getGroupReport(groupId, from, to),
  });

/** Read after the route's loader has the report, so the page renders with it from the start. */
export const useGroupReport = (groupId: number, from?: string, to?: string) =>
  useSuspenseQuery(groupReportQuery(groupId, from, to));
