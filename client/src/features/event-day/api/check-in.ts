import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CheckInInput } from '../../../../../shared/schemas/event-day';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { CheckInResult } from './types';

export interface CheckInVariables {
  reference: string;
  body: CheckInInput;
}

export const checkIn = ({ reference, body }: CheckInVariables) =>
  api<CheckInResult>('POST', `/api/bookings/${encodeURIComponent(reference)}/check-in`, body);

export function useCheckIn(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: checkIn,
    onSuccess: () => qc.invalidateQueries({ queryKey: eventDayKeys.desk(eventId) }),
  });
}
