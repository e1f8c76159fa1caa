import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventDetail } from '../../../../../shared/api/events';
import { api } from '../../../lib/api';
import { eventKeys } from './keys';

const getEvent = (id: number) => api<EventDetail>('GET', `/api/events/${id}`);

export const eventQuery = (id: number) => queryOptions({ queryKey: eventKeys.detail(id), queryFn: () => getEvent(id) });

/** An id of 0 (not known yet) waits instead of asking. */
export const useEvent = (id: number) => useQuery({ ...eventQuery(id), enabled: id > 0 });
