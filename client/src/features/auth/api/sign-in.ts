import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LoginInput, SessionUser } from '../../../../../shared/schemas/auth';
import { api, forgetCsrfToken } from '../../../lib/api';
import { userKeys } from '../../../lib/auth';
import { authKeys } from './keys';

export function useSignIn() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: LoginInput) => api<{ user: SessionUser }>('POST', '/api/auth/login', input),
    onSuccess: ({ user }) => {
      forgetCsrfToken();
      qc.setQueryData(userKeys.me, user);
    },
  });
}

export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>('POST', '/api/auth/logout'),
    onSettled: () => {
      forgetCsrfToken();
      qc.clear();
      qc.setQueryData(userKeys.me, null);
    },
  });
}

export function useCreateFirstAdmin() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { name: string; email: string; password: string; confirm: string }) =>
      api<{ user: SessionUser }>('POST', '/api/auth/first-admin', input),
    onSuccess: ({ user }) => {
      forgetCsrfToken();
      qc.setQueryData(userKeys.me, user);
      qc.invalidateQueries({ queryKey: authKeys.config });
    },
  });
}
