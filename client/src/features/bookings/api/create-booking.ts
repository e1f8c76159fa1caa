import { useMutation } from '@tanstack/react-query';
import type { BookingCreated } from '../../../../../shared/api/bookings';
import type { CreateBookingInput } from '../../../../../shared/schemas/bookings';
import { api } from '../../../lib/api';

const createBooking = (input: CreateBookingInput, idempotencyKey: string) =>
  api<BookingCreated>('POST', '/api/bookings', input, { 'Idempotency-Key': idempotencyKey });

/**
 * The key is made once per filled-in form, so pressing "Book" twice books once. `onSettled` lets the route refresh
 * what other features show (the session's free places).
 */
export const useCreateBooking = (idempotencyKey: string, onSettled?: () => void) =>
  useMutation({ mutationFn: (input: CreateBookingInput) => createBooking(input, idempotencyKey), onSettled });
