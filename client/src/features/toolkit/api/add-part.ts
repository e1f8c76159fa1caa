import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SalvagePart } from './types';
import type { SalvagePartInput } from '../../../../../shared/schemas/toolkit';
import { api } from '../../../lib/api';
import { toolkitKeys } from './keys';

export const addPart = (groupId: number, body: SalvagePartInput) =>
  api<SalvagePart>('POST', `/api/groups/${groupId}/salvage`, body);

export function useAddPart(groupId: number, onChanged?: () => void) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SalvagePartInput) => addPart(groupId, body),
    onSuccess: () => {
      onChanged?.();
      return qc.invalidateQueries({ queryKey: toolkitKeys.salvage.group(groupId) });
    },
  });
}
