import { queryOptions, useQuery } from '@tanstack/react-query';
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

export const useGroupReport = (groupId: number, from?: string, to?: string) =>
  useQuery(groupReportQuery(groupId, from, to));
