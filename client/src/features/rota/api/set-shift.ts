import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { myShiftSchema } from '../../../../../shared/schemas/rota';
import { api } from '../../../lib/api';
import { rotaKeys } from './keys';
import type { ShiftAnswer } from './types';

/** A volunteer's answer for one session, as sent (hours as ISO strings, left out for the opening hours). */
export type ShiftChoice = { eventId: number } & z.input<typeof myShiftSchema>;

export const setShift = ({ eventId, ...answer }: ShiftChoice) =>
  api<ShiftAnswer>('PUT', `/api/events/${eventId}/shifts/me`, answer);

/** A volunteer's answer changes their sessions and the organisers' rota of that session. */
export function useSetShift() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: setShift, onSuccess: () => qc.invalidateQueries({ queryKey: rotaKeys.all }) });
}
