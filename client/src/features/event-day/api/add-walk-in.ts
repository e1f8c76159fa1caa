import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { WalkInInput } from '../../../../../shared/schemas/event-day';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { WalkInResult } from './types';

export const addWalkIn = (eventId: number, body: WalkInInput) =>
  api<WalkInResult>('POST', `/api/events/${eventId}/walk-ins`, body);

export function useAddWalkIn(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: WalkInInput) => addWalkIn(eventId, body),
    onSuccess: () => qc.invalidateQueries({ queryKey: eventDayKeys.desk(eventId) }),
  });
}
