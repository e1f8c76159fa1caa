import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BookingView } from '../../../../../shared/api/bookings';
import { api } from '../../../lib/api';
import { bookingKeys } from './keys';

const getBooking = (reference: string, token: string) =>
  api<BookingView>('GET', `/api/bookings/${reference}`, undefined, { 'X-Manage-Token': token });

export const bookingQuery = (reference: string, token: string) =>
  queryOptions({ queryKey: bookingKeys.detail(reference), queryFn: () => getBooking(reference, token) });

export const useBooking = (reference: string, token: string) =>
  useQuery({ ...bookingQuery(reference, token), enabled: Boolean(token) });
