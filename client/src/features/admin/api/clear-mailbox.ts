import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { adminKeys } from './keys';

const clearMailbox = () => api('DELETE', '/api/admin/mailbox');

export function useClearMailbox() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: clearMailbox,
    onSuccess: () => qc.invalidateQueries({ queryKey: adminKeys.mailbox() }),
  });
}
