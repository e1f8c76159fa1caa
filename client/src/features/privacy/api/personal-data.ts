import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api';

/** Where the JSON copy of a booking's data is downloaded (the manage link's token is the key). */
export const bookingDataUrl = (reference: string, token: string) =>
  `/api/bookings/${reference}/personal-data?token=${encodeURIComponent(token)}`;

/** The signed-in volunteer's copy of their account. */
export const accountDataUrl = () => '/api/me/personal-data';

/** Erases a visitor's details: with the manage token (the visitor), or without it as the group's organiser. */
export function useErasePersonalData(onDone?: () => void) {
  return useMutation({
    mutationFn: ({ reference, token }: { reference: string; token?: string }) =>
      api('DELETE', `/api/bookings/${reference}/personal-data${token ? `?token=${encodeURIComponent(token)}` : ''}`),
    onSuccess: () => onDone?.(),
  });
}

export function useCloseAccount(onDone?: () => void) {
  return useMutation({
    mutationFn: () => api('DELETE', '/api/me/account', { confirm: true }),
    onSuccess: () => onDone?.(),
  });
}
