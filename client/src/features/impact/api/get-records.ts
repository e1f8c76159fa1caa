import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { RecordsFilter } from '../../../../../shared/api/impact';
import type { RecordsPage } from './types';
import { api } from '../../../lib/api';
import { queryString } from '../../../lib/query-string';
import { impactKeys } from './keys';

export const getRecords = (f: RecordsFilter) => api<RecordsPage>('GET', `/api/stats/records${queryString(f)}`);

export const recordsQuery = (f: RecordsFilter) =>
  queryOptions({ queryKey: impactKeys.records(f), queryFn: () => getRecords(f) });

/** Read after the route's loader has the records page, so the page renders with it from the start. */
export const useRecords = (f: RecordsFilter) => useSuspenseQuery(recordsQuery(f));
