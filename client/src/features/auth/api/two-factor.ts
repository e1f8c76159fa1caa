import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SessionUser } from '../../../../../shared/schemas/auth';
import { api, forgetCsrfToken } from '../../../lib/api';
import { userKeys } from '../../../lib/auth';
import { authKeys } from './keys';

interface TwoFactorStatus {
  enabled: boolean;
  available: boolean;
}
interface TwoFactorSetup {
  secret: string;
  uri: string;
  qr: string;
}

export const useTwoFactorStatus = () =>
  useQuery({
    queryKey: authKeys.twoFactor(),
    queryFn: () => api<TwoFactorStatus>('GET', '/api/auth/two-factor'),
  });

export const useStartTwoFactor = () =>
  useMutation({ mutationFn: () => api<TwoFactorSetup>('POST', '/api/auth/two-factor/setup') });

export function useEnableTwoFactor() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { code: string }) => api<{ message: string }>('POST', '/api/auth/two-factor/enable', input),
    onSuccess: () => qc.invalidateQueries({ queryKey: authKeys.twoFactor() }),
  });
}

export function useDisableTwoFactor() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { password: string; code: string }) =>
      api<{ message: string }>('POST', '/api/auth/two-factor/disable', input),
    onSuccess: () => qc.invalidateQueries({ queryKey: authKeys.twoFactor() }),
  });
}

/** The second step of a sign-in: the session gets its user, and a new CSRF token, only now. */
export function useSignInCode() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { code: string }) => api<{ user: SessionUser }>('POST', '/api/auth/login/code', input),
    onSuccess: ({ user }) => {
      forgetCsrfToken();
      qc.setQueryData(userKeys.me, user);
    },
  });
}
