import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { groupKeys } from './keys';

const approveMember = (groupId: number, membershipId: number) =>
  api('POST', `/api/groups/${groupId}/members/${membershipId}/approve`);

export function useApproveMember(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (membershipId: number) => approveMember(groupId, membershipId),
    onSuccess: () => qc.invalidateQueries({ queryKey: groupKeys.members(groupId) }),
  });
}
