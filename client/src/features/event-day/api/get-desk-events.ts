import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { DeskEvent } from './types';

export const getDeskEvents = () => api<DeskEvent[]>('GET', '/api/desk/events');

export const deskEventsQuery = () => queryOptions({ queryKey: eventDayKeys.deskEvents(), queryFn: getDeskEvents });

/** Read after the route's loader has it; a failure to load is the route's error. */
export const useDeskEvents = () => useSuspenseQuery(deskEventsQuery());
