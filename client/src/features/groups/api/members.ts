import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { GroupRole, MembershipStatus } from '../../../../../shared/constants';
import { api } from '../../../lib/api';
import { groupKeys } from './public-groups';

export interface Member {
  membershipId: number;
  userId: number;
  name: string;
  email: string;
  role: GroupRole;
  status: MembershipStatus;
  since: string;
  verified: boolean;
}

export const useMembers = (groupId: number) =>
  useQuery({
    queryKey: groupKeys.members(groupId),
    queryFn: () =>
      api<{ group: { id: number; name: string; town: string }; members: Member[] }>(
        'GET',
        `/api/groups/${groupId}/members`,
      ),
  });

export function useApproveMember(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (membershipId: number) => api('POST', `/api/groups/${groupId}/members/${membershipId}/approve`),
    onSuccess: () => qc.invalidateQueries({ queryKey: groupKeys.members(groupId) }),
  });
}

export function useRemoveMember(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (membershipId: number) => api('DELETE', `/api/groups/${groupId}/members/${membershipId}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: groupKeys.members(groupId) }),
  });
}
