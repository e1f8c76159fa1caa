import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { rotaKeys } from './keys';

/** Seats a coming fixer at one bench, or lets them move freely (`benchId: null`). */
export const seatFixer = (eventId: number, userId: number, benchId: number | null) =>
  api('PATCH', `/api/events/${eventId}/shifts/${userId}`, { benchId });

/** A seat changes the rota and the triage board; `onChanged` lets the page refresh the board. */
export function useSeatFixer(eventId: number, onChanged?: () => void) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, benchId }: { userId: number; benchId: number | null }) =>
      seatFixer(eventId, userId, benchId),
    onSuccess: () => {
      onChanged?.();
      return qc.invalidateQueries({ queryKey: rotaKeys.event(eventId) });
    },
  });
}
