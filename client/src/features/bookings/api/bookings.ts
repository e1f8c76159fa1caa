import type { ItemStatus, Outcome } from '../../../../../shared/event-day/constants';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CreateBookingInput } from '../../../../../shared/schemas/bookings';
import { api } from '../../../lib/api';
import { eventKeys } from '../../events/api/events';

export interface BookingCreated {
  reference: string;
  manageToken: string;
  eventId: number;
  slotId: number;
  itemIds: number[];
}
export interface BookingView {
  reference: string;
  status: 'confirmed' | 'cancelled';
  visitor: { name: string; email: string; phone: string | null };
  event: {
    id: number;
    title: string;
    status: string;
    startsAt: string;
    endsAt: string;
    groupName: string;
    timeZone: string;
    houseRules: string;
  };
  venue: { name: string; address: string; town: string; accessNotes: string };
  slot: { id: number; startsAt: string; endsAt: string };
  items: {
    id: number;
    categoryName: string;
    brand: string | null;
    model: string | null;
    ageYears: number | null;
    fault: string;
    mains: boolean;
    status: ItemStatus;
    queueNumber: number | null;
    outcome: Outcome | null;
    photos: { id: number; width: number; height: number }[];
  }[];
  qr: string;
}

export const bookingKeys = { detail: (ref: string) => ['booking', ref] as const };

/** The key is made once per filled-in form, so pressing "Book" twice books once. */
export function useCreateBooking(idempotencyKey: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateBookingInput) =>
      api<BookingCreated>('POST', '/api/bookings', input, { 'Idempotency-Key': idempotencyKey }),
    onSettled: () => qc.invalidateQueries({ queryKey: eventKeys.all }),
  });
}

/** Photos go up one item at a time after the booking exists. */
export function uploadPhotos(reference: string, token: string, itemId: number, files: File[]) {
  const form = new FormData();
  for (const f of files) form.append('photos', f, f.name);
  return api<{ id: number }[]>(
    'POST',
    `/api/bookings/${reference}/items/${itemId}/photos?token=${encodeURIComponent(token)}`,
    form,
  );
}

export const useBooking = (reference: string, token: string) =>
  useQuery({
    queryKey: bookingKeys.detail(reference),
    queryFn: () => api<BookingView>('GET', `/api/bookings/${reference}?token=${encodeURIComponent(token)}`),
    enabled: Boolean(token),
  });

export function useCancelBooking(reference: string, token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('DELETE', `/api/bookings/${reference}?token=${encodeURIComponent(token)}`),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: bookingKeys.detail(reference) });
      qc.invalidateQueries({ queryKey: eventKeys.all });
    },
  });
}

export function useMoveBooking(reference: string, token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (slotId: number) =>
      api<BookingView>('POST', `/api/bookings/${reference}/move?token=${encodeURIComponent(token)}`, { slotId }),
    onSuccess: (b) => {
      qc.setQueryData(bookingKeys.detail(reference), b);
      qc.invalidateQueries({ queryKey: eventKeys.all });
    },
  });
}

export const useJoinWaitlist = (eventId: number) =>
  useMutation({
    mutationFn: (input: CreateBookingInput) =>
      api<{ position: number }>('POST', `/api/events/${eventId}/waitlist`, input),
  });

export interface OfferView {
  status: 'waiting' | 'offered' | 'claimed' | 'expired' | 'withdrawn';
  expiresAt: string | null;
  places: number;
  visitorName: string;
  event: { id: number; title: string; groupName: string; timeZone: string };
  venue: { name: string; address: string; town: string };
  slot: { startsAt: string; endsAt: string };
}
export const useOffer = (token: string) =>
  useQuery({ queryKey: ['offer', token], queryFn: () => api<OfferView>('GET', `/api/waiting-list/${token}`) });
export const useClaimOffer = (token: string) =>
  useMutation({ mutationFn: () => api<BookingCreated>('POST', `/api/waiting-list/${token}/claim`) });
