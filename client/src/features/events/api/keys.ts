import type { EventFilters } from '../../../../../shared/api/events';

/** Every query key of the events feature; invalidate by `eventKeys.all`. */
export const eventKeys = {
  all: ['events'] as const,
  list: (f: EventFilters) => [...eventKeys.all, 'list', f] as const,
  detail: (id: number) => [...eventKeys.all, 'detail', id] as const,
  group: (groupId: number) => [...eventKeys.all, 'group', groupId] as const,
  bookings: (id: number) => [...eventKeys.all, 'bookings', id] as const,
};
