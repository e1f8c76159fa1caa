import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Coming } from '../../../../../shared/api/events';
import { api } from '../../../lib/api';
import { eventKeys } from './keys';

/** What is coming to an event: every booking with its items, and counts by category and skill. */
const getEventBookings = (id: number) => api<Coming>('GET', `/api/events/${id}/bookings`);

export const eventBookingsQuery = (id: number) =>
  queryOptions({ queryKey: eventKeys.bookings(id), queryFn: () => getEventBookings(id) });

export const useEventBookings = (id: number) => useQuery(eventBookingsQuery(id));
