import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OfferView } from '../../../../../shared/api/bookings';
import { api } from '../../../lib/api';
import { bookingKeys } from './keys';

const getOffer = (token: string) => api<OfferView>('GET', `/api/waiting-list/${token}`);

export const offerQuery = (token: string) =>
  queryOptions({ queryKey: bookingKeys.offer(token), queryFn: () => getOffer(token) });

export const useOffer = (token: string) => useQuery(offerQuery(token));
