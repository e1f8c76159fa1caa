import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { DeskView } from './types';

export const getDesk = (eventId: number) => api<DeskView>('GET', `/api/events/${eventId}/desk`);

/** Reception sees other desks' check-ins within 20 seconds. */
export const deskQuery = (eventId: number) =>
  queryOptions({ queryKey: eventDayKeys.desk(eventId), queryFn: () => getDesk(eventId), refetchInterval: 20_000 });

/** Read after the route's loader has it; a failure to load is the route's error. */
export const useDesk = (eventId: number) => useSuspenseQuery(deskQuery(eventId));
