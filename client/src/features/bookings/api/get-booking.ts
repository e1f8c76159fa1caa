import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BookingView } from '../../../../../shared/api/bookings';
import { api } from '../../../lib/api';
import { bookingKeys } from './keys';

const getBooking = (reference: string, token: string) =>
  api<BookingView>('GET', `/api/bookings/${reference}`, undefined, { 'X-Manage-Token': token });

/** Asked again every 4 minutes while open: the signed photo and calendar addresses in it last 10 to 15 minutes. */
export const bookingQuery = (reference: string, token: string) =>
  queryOptions({
    queryKey: bookingKeys.detail(reference),
    queryFn: () => getBooking(reference, token),
    refetchInterval: 4 * 60_000,
  });

export const useBooking = (reference: string, token: string) =>
  useQuery({ ...bookingQuery(reference, token), enabled: Boolean(token) });
