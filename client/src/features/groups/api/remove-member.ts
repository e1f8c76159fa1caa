import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { groupKeys } from './keys';

const removeMember = (groupId: number, membershipId: number) =>
  api('DELETE', `/api/groups/${groupId}/members/${membershipId}`);

export function useRemoveMember(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (membershipId: number) => removeMember(groupId, membershipId),
    onSuccess: () => qc.invalidateQueries({ queryKey: groupKeys.members(groupId) }),
  });
}
