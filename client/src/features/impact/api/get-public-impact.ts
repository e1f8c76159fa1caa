import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { PublicImpact } from './types';
import { api } from '../../../lib/api';
import { queryString } from '../../../lib/query-string';
import { impactKeys } from './keys';

export const getPublicImpact = (groupId?: number) =>
  api<PublicImpact>('GET', `/api/public/impact${queryString({ groupId })}`);

export const publicImpactQuery = (groupId?: number) =>
  queryOptions({ queryKey: impactKeys.public(groupId), queryFn: () => getPublicImpact(groupId) });

/** Read after the route's loader has the figures, so the page renders with them from the start. */
export const usePublicImpact = (groupId?: number) => useSuspenseQuery(publicImpactQuery(groupId));
