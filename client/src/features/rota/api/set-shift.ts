import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShiftAnswer } from '../../../../../shared/api/rota';
import { api } from '../../../lib/api';
import { rotaKeys } from './keys';

export const setShift = ({ eventId, ...answer }: ShiftAnswer) => api('PUT', `/api/events/${eventId}/shifts/me`, answer);

/** A volunteer's answer changes their sessions and the organisers' rota of that session. */
export function useSetShift() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: setShift, onSuccess: () => qc.invalidateQueries({ queryKey: rotaKeys.all }) });
}
