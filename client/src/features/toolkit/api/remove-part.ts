import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { toolkitKeys } from './keys';

export const removePart = (id: number) => api<void>('DELETE', `/api/salvage/${id}`);

export function useRemovePart(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: removePart,
    onSuccess: () => qc.invalidateQueries({ queryKey: toolkitKeys.salvage.group(groupId) }),
  });
}
