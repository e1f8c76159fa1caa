import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api';

/** The manage token goes in a header, as for the rest of the booking, never in the URL. */
const tokenHeader = (token?: string): Record<string, string> => (token ? { 'X-Manage-Token': token } : {});

/** Fetches the JSON copy of a booking's data (the manage link's token is the key) and saves it as a file. */
export function useDownloadBookingData() {
  return useMutation({
    mutationFn: async ({ reference, token }: { reference: string; token: string }) => {
      const copy = await api<unknown>('GET', `/api/bookings/${reference}/personal-data`, undefined, tokenHeader(token));
      const url = URL.createObjectURL(new Blob([JSON.stringify(copy, null, 2)], { type: 'application/json' }));
      const a = document.createElement('a');
      a.href = url;
      a.download = `mendery-booking-${reference}.json`;
      document.body.append(a);
      a.click();
      a.remove();
      setTimeout(() => URL.revokeObjectURL(url), 60_000);
    },
  });
}

/** The signed-in volunteer's copy of their account. */
export const accountDataUrl = () => '/api/me/personal-data';

/** Erases a visitor's details: with the manage token (the visitor), or without it as the group's organiser. */
export function useErasePersonalData(onDone?: () => void) {
  return useMutation({
    mutationFn: ({ reference, token }: { reference: string; token?: string }) =>
      api('DELETE', `/api/bookings/${reference}/personal-data`, undefined, tokenHeader(token)),
    onSuccess: () => onDone?.(),
  });
}

export function useCloseAccount(onDone?: () => void) {
  return useMutation({
    mutationFn: () => api('DELETE', '/api/me/account', { confirm: true }),
    onSuccess: () => onDone?.(),
  });
}
