import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LoginInput, SessionUser } from '../../../../../shared/schemas/auth';
import { api, forgetCsrfToken } from '../../../lib/api';
import { userKeys } from '../../../lib/auth';

const signIn = (input: LoginInput) =>
  api<{ user: SessionUser | null; needsCode?: boolean }>('POST', '/api/auth/login', input);

/** A new session has a new CSRF token; the user is known at once, or after the code when two-step sign-in is on. */
export function useSignIn() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: ({ user }) => {
      forgetCsrfToken();
      if (user) qc.setQueryData(userKeys.me, user);
    },
  });
}
