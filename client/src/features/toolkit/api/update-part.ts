import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SalvagePart } from './types';
import { api } from '../../../lib/api';
import { toolkitKeys } from './keys';

export interface PartPatch {
  quantity?: number;
  box?: string;
}

export const updatePart = (id: number, patch: PartPatch) => api<SalvagePart>('PATCH', `/api/salvage/${id}`, patch);

export function useUpdatePart(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...patch }: PartPatch & { id: number }) => updatePart(id, patch),
    onSuccess: () => qc.invalidateQueries({ queryKey: toolkitKeys.salvage.group(groupId) }),
  });
}
