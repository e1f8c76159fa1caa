import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { FollowUp } from './types';
import { api } from '../../../lib/api';

import { impactKeys } from './keys';

export const getFollowUps = (groupId: number) => api<FollowUp[]>('GET', `/api/groups/${groupId}/follow-ups`);

export const followUpsQuery = (groupId: number) =>
  queryOptions({ queryKey: impactKeys.followUps(groupId), queryFn: () => getFollowUps(groupId) });

/** Read after the route's loader has the follow-ups list, so the page renders with it from the start. */
export const useFollowUps = (groupId: number) => useSuspenseQuery(followUpsQuery(groupId));
