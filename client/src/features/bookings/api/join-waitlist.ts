import { useMutation } from '@tanstack/react-query';
import type { CreateBookingInput } from '../../../../../shared/schemas/bookings';
import { api } from '../../../lib/api';

const joinWaitlist = (eventId: number, input: CreateBookingInput) =>
  api<{ position: number }>('POST', `/api/events/${eventId}/waitlist`, input);

export const useJoinWaitlist = (eventId: number) =>
  useMutation({ mutationFn: (input: CreateBookingInput) => joinWaitlist(eventId, input) });
