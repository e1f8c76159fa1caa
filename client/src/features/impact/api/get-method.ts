import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { Method } from './types';
import { api } from '../../../lib/api';
import { impactKeys } from './keys';

export const getMethod = () => api<Method>('GET', '/api/stats/method');

/** How the figures are counted changes only with an admin's edit: ten minutes fresh. */
export const methodQuery = () =>
  queryOptions({ queryKey: impactKeys.method(), queryFn: getMethod, staleTime: 10 * 60_000 });

/** Read after the route's loader has the method, so the page renders with it from the start. */
export const useMethod = () => useSuspenseQuery(methodQuery());
