import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { MyEvent } from './types';
import { api } from '../../../lib/api';
import { rotaKeys } from './keys';

export const getMyEvents = () => api<MyEvent[]>('GET', '/api/me/events');

export const myEventsQuery = () => queryOptions({ queryKey: rotaKeys.myEvents(), queryFn: getMyEvents });

/** Read after the route's loader has the sessions, so the page renders with them from the start. */
export const useMyEvents = () => useSuspenseQuery(myEventsQuery());
