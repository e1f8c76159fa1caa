import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, forgetCsrfToken } from '../../../lib/api';
import { userKeys } from '../../../lib/auth';

const signOut = () => api<void>('POST', '/api/auth/logout');

/** Whatever the answer, nothing of the last person stays in the cache. */
export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSettled: () => {
      forgetCsrfToken();
      qc.clear();
      qc.setQueryData(userKeys.me, null);
    },
  });
}
