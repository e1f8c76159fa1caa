import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { adminKeys } from './keys';

export const mergeGroup = ({ from, into }: { from: number; into: number }) =>
  api<void>('POST', `/api/admin/groups/${from}/merge`, { into });

export function useMergeGroup() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: mergeGroup,
    onSuccess: () => qc.invalidateQueries({ queryKey: adminKeys.groups() }),
  });
}
