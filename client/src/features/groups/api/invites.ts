import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { GroupRole } from '../../../../../shared/constants';
import type { SessionUser } from '../../../../../shared/schemas/auth';
import { api, forgetCsrfToken } from '../../../lib/api';
import { userKeys } from '../../../lib/auth';

export const useInvite = (groupId: number) =>
  useMutation({
    mutationFn: (v: { email: string; role: GroupRole }) => api('POST', `/api/groups/${groupId}/invites`, v),
  });
export const useInvitation = (token: string) =>
  useQuery({
    queryKey: ['invite', token],
    queryFn: () =>
      api<{ groupName: string; role: GroupRole; email: string; hasAccount: boolean }>('GET', `/api/invites/${token}`),
  });
export function useAcceptInvite(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('POST', `/api/invites/${token}/accept`),
    onSuccess: () => qc.invalidateQueries({ queryKey: userKeys.me }),
  });
}
export function useSignupFromInvite(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { name: string; password: string }) =>
      api<{ user: SessionUser }>('POST', `/api/invites/${token}/signup`, v),
    onSuccess: ({ user }) => {
      forgetCsrfToken();
      qc.setQueryData(userKeys.me, user);
    },
  });
}
