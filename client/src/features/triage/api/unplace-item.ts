import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { triageKeys } from './keys';

/** Takes an item off its bench; it waits again until the next run or a placement by hand. */
export const unplaceItem = (eventId: number, itemId: number) =>
  api('DELETE', `/api/events/${eventId}/items/${itemId}/placement`);

export function useUnplaceItem(eventId: number, itemId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => unplaceItem(eventId, itemId),
    onSuccess: () => qc.invalidateQueries({ queryKey: triageKeys.board(eventId) }),
  });
}
