import { queryOptions, useQuery } from '@tanstack/react-query';
import type { StatsFilter } from '../../../../../shared/api/impact';
import type { Stats } from './types';
import { api } from '../../../lib/api';
import { queryString } from '../../../lib/query-string';
import { impactKeys } from './keys';

export const getStats = (f: StatsFilter) => api<Stats>('GET', `/api/stats${queryString(f)}`);

export const statsQuery = (f: StatsFilter) =>
  queryOptions({ queryKey: impactKeys.stats(f), queryFn: () => getStats(f) });

export const useStats = (f: StatsFilter) => useQuery(statsQuery(f));
