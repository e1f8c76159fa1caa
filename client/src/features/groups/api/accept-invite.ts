import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { userKeys } from '../../../lib/auth';

const acceptInvite = (token: string) => api('POST', `/api/invites/${token}/accept`);

/** The new role shows at once: the signed-in user is read again. */
export function useAcceptInvite(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => acceptInvite(token),
    onSuccess: () => qc.invalidateQueries({ queryKey: userKeys.me }),
  });
}
