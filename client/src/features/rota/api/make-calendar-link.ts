import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CalendarLink } from '../../../../../shared/api/rota';
import { api } from '../../../lib/api';
import { rotaKeys } from './keys';

export const makeCalendarLink = () => api<CalendarLink>('POST', '/api/me/calendar-link');

/** A new link replaces the old one; the answer is the only time the URL is shown. */
export function useMakeCalendarLink() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: makeCalendarLink,
    onSuccess: () => qc.invalidateQueries({ queryKey: rotaKeys.calendarLink() }),
  });
}
