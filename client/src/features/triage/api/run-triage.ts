import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TriageRunResult } from './types';
import { api } from '../../../lib/api';
import { triageKeys } from './keys';

/** Places the session's items (or one slot's); locked placements stay where they are. */
export const runTriage = (eventId: number, slotId?: number) =>
  api<TriageRunResult>('POST', `/api/events/${eventId}/triage`, slotId ? { slotId } : {});

export function useRunTriage(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (slotId?: number) => runTriage(eventId, slotId),
    onSuccess: () => qc.invalidateQueries({ queryKey: triageKeys.board(eventId) }),
  });
}
