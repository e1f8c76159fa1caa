import { useQueryClient } from '@tanstack/react-query';
import { api, forgetCsrfToken } from '../../../lib/api';
import { userKeys } from '../../../lib/auth';

const signOut = () => api<void>('POST', '/api/auth/logout');

/**
 * Whatever the answer, nothing of the last person stays in the cache. A plain call rather than a mutation hook: the
 * menu shows no progress for it, and the shell every page loads stays smaller without the mutation code.
 */
export function useSignOut() {
  const qc = useQueryClient();
  return async () => {
    try {
      await signOut();
    } catch {
      // Signed out or not, this browser forgets the person below.
    } finally {
      forgetCsrfToken();
      qc.clear();
      qc.setQueryData(userKeys.me, null);
    }
  };
}
