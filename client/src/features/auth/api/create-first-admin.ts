import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionUser } from '../../../../../shared/schemas/auth';
import { api, forgetCsrfToken } from '../../../lib/api';
import { userKeys } from '../../../lib/auth';
import { authKeys } from './keys';

type FirstAdminInput = { name: string; email: string; password: string; confirm: string; setupCode: string };

const createFirstAdmin = (input: FirstAdminInput) => api<{ user: SessionUser }>('POST', '/api/auth/first-admin', input);

export function useCreateFirstAdmin() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createFirstAdmin,
    onSuccess: ({ user }) => {
      forgetCsrfToken();
      qc.setQueryData(userKeys.me, user);
      qc.invalidateQueries({ queryKey: authKeys.config() });
    },
  });
}
