import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlacementResult } from './types';
import { api } from '../../../lib/api';
import { triageKeys } from './keys';

export interface Placement {
  userId: number;
  benchId: number;
  locked: boolean;
}

/** Places an item by hand; the server keeps a placement that breaks a rule and answers with the warnings. */
export const placeItem = (eventId: number, itemId: number, placement: Placement) =>
  api<PlacementResult>('PUT', `/api/events/${eventId}/items/${itemId}/placement`, placement);

export function usePlaceItem(eventId: number, itemId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (placement: Placement) => placeItem(eventId, itemId, placement),
    onSuccess: () => qc.invalidateQueries({ queryKey: triageKeys.board(eventId) }),
  });
}
