import { queryOptions } from '@tanstack/react-query';
import type { GroupMembers } from '../../../../../shared/api/groups';
import { api } from '../../../lib/api';
import { groupKeys } from './keys';

const getMembers = (groupId: number) => api<GroupMembers>('GET', `/api/groups/${groupId}/members`);

export const membersQuery = (groupId: number) =>
  queryOptions({ queryKey: groupKeys.members(groupId), queryFn: () => getMembers(groupId) });
