import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BookingView } from '../../../../../shared/api/bookings';
import { api } from '../../../lib/api';
import { bookingKeys } from './keys';

const moveBooking = (reference: string, token: string, slotId: number) =>
  api<BookingView>('POST', `/api/bookings/${reference}/move`, { slotId }, { 'X-Manage-Token': token });

export function useMoveBooking(reference: string, token: string, onChanged?: () => void) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (slotId: number) => moveBooking(reference, token, slotId),
    onSuccess: (b) => {
      qc.setQueryData(bookingKeys.detail(reference), b);
      onChanged?.();
    },
  });
}

/** After the photos of a booking change, its page reads it again. */
export function useRefreshBooking(reference: string) {
  const qc = useQueryClient();
  return () => qc.invalidateQueries({ queryKey: bookingKeys.detail(reference) });
}
