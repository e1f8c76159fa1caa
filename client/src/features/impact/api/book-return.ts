import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReturnBooked } from './types';
import { api } from '../../../lib/api';
import { impactKeys } from './keys';

export const bookReturn = (token: string, slotId: number) =>
  api<ReturnBooked>('POST', `/api/rebook/${token}`, { slotId });

export function useBookReturn(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (slotId: number) => bookReturn(token, slotId),
    onSuccess: () => qc.invalidateQueries({ queryKey: impactKeys.rebook(token) }),
  });
}
