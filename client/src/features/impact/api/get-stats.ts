import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { StatsFilter } from '../../../../../shared/api/impact';
import type { Stats } from './types';
import { api } from '../../../lib/api';
import { queryString } from '../../../lib/query-string';
import { impactKeys } from './keys';

export const getStats = (f: StatsFilter) => api<Stats>('GET', `/api/stats${queryString(f)}`);

export const statsQuery = (f: StatsFilter) =>
  queryOptions({ queryKey: impactKeys.stats(f), queryFn: () => getStats(f) });

/** Read after the route's loader has the figures, so the page renders with it from the start. */
export const useStats = (f: StatsFilter) => useSuspenseQuery(statsQuery(f));
