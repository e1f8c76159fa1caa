import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BookingCodeStatus } from '../../../../../shared/api/bookings';
import { api } from '../../../lib/api';
import { bookingKeys } from './keys';

const getBookingCode = (reference: string) =>
  api<BookingCodeStatus>('GET', `/api/public/bookings/${encodeURIComponent(reference)}`);

export const bookingCodeQuery = (reference: string) =>
  queryOptions({ queryKey: bookingKeys.code(reference), queryFn: () => getBookingCode(reference), retry: false });

export const useBookingCode = (reference: string) => useQuery(bookingCodeQuery(reference));
