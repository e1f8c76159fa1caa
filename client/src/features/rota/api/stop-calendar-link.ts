import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { rotaKeys } from './keys';

export const stopCalendarLink = () => api<void>('DELETE', '/api/me/calendar-link');

export function useStopCalendarLink() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: stopCalendarLink,
    onSuccess: () => qc.invalidateQueries({ queryKey: rotaKeys.calendarLink() }),
  });
}
