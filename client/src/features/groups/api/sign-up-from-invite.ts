import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionUser } from '../../../../../shared/schemas/auth';
import { api, forgetCsrfToken } from '../../../lib/api';
import { userKeys } from '../../../lib/auth';

const signUpFromInvite = (token: string, v: { name: string; password: string }) =>
  api<{ user: SessionUser }>('POST', `/api/invites/${token}/signup`, v);

/** The account is made and signed in; the session is new, so its CSRF token is fetched again. */
export function useSignUpFromInvite(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { name: string; password: string }) => signUpFromInvite(token, v),
    onSuccess: ({ user }) => {
      forgetCsrfToken();
      qc.setQueryData(userKeys.me, user);
    },
  });
}
