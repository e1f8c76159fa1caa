import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { ItemView } from './types';

export const startRepair = (id: number) => api<ItemView>('POST', `/api/items/${id}/start`, {});

export function useStartRepair(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => startRepair(id),
    onSuccess: (item) => qc.setQueryData(eventDayKeys.item(id), item),
  });
}
