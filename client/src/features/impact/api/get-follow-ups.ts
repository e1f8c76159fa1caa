import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FollowUp } from './types';
import { api } from '../../../lib/api';

import { impactKeys } from './keys';

export const getFollowUps = (groupId: number) => api<FollowUp[]>('GET', `/api/groups/${groupId}/follow-ups`);

export const followUpsQuery = (groupId: number) =>
  queryOptions({ queryKey: impactKeys.followUps(groupId), queryFn: () => getFollowUps(groupId) });

export const useFollowUps = (groupId: number) => useQuery(followUpsQuery(groupId));
