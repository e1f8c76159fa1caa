import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { bookingKeys } from './keys';

const cancelBooking = (reference: string, token: string) =>
  api('DELETE', `/api/bookings/${reference}`, undefined, { 'X-Manage-Token': token });

export function useCancelBooking(reference: string, token: string, onChanged?: () => void) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => cancelBooking(reference, token),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: bookingKeys.detail(reference) });
      onChanged?.();
    },
  });
}
