import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { triageKeys } from './keys';

/** A locked placement is kept by every later triage run. */
export const lockItem = (eventId: number, itemId: number, locked: boolean) =>
  api('POST', `/api/events/${eventId}/items/${itemId}/lock`, { locked });

export function useLockItem(eventId: number, itemId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (locked: boolean) => lockItem(eventId, itemId, locked),
    onSuccess: () => qc.invalidateQueries({ queryKey: triageKeys.board(eventId) }),
  });
}
