import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SalvagePart } from './types';
import { api } from '../../../lib/api';
import { toolkitKeys } from './keys';

export const takePart = (partId: number, itemId?: number) =>
  api<SalvagePart>('POST', `/api/salvage/${partId}/take`, { itemId });

/** Taking a part changes the stock and its substitutes; `onChanged` lets the item's page refresh what it shows. */
export function useTakePart(groupId: number, itemId?: number, onChanged?: () => void) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (partId: number) => takePart(partId, itemId),
    onSuccess: () => {
      onChanged?.();
      return qc.invalidateQueries({ queryKey: toolkitKeys.salvage.group(groupId) });
    },
  });
}
