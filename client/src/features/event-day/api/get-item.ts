import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { ItemView } from './types';

export const getItem = (id: number) => api<ItemView>('GET', `/api/items/${id}`);

export const itemQuery = (id: number) => queryOptions({ queryKey: eventDayKeys.item(id), queryFn: () => getItem(id) });

/** Read after the route's loader has it; a failure to load is the route's error. */
export const useItem = (id: number) => useSuspenseQuery(itemQuery(id));
