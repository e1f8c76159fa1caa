import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MyEvent } from './types';
import { api } from '../../../lib/api';
import { rotaKeys } from './keys';

export const getMyEvents = () => api<MyEvent[]>('GET', '/api/me/events');

export const myEventsQuery = () => queryOptions({ queryKey: rotaKeys.myEvents(), queryFn: getMyEvents });

export const useMyEvents = () => useQuery(myEventsQuery());
