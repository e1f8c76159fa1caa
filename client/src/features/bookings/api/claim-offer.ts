import { useMutation } from '@tanstack/react-query';
import type { BookingCreated } from '../../../../../shared/api/bookings';
import { api } from '../../../lib/api';

const claimOffer = (token: string) => api<BookingCreated>('POST', `/api/waiting-list/${token}/claim`);

export const useClaimOffer = (token: string) => useMutation({ mutationFn: () => claimOffer(token) });
