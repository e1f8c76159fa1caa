import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { DeskEvent } from './types';

export const getDeskEvents = () => api<DeskEvent[]>('GET', '/api/desk/events');

export const deskEventsQuery = () => queryOptions({ queryKey: eventDayKeys.deskEvents(), queryFn: getDeskEvents });

export const useDeskEvents = () => useQuery(deskEventsQuery());
