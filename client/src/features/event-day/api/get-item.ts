import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { ItemView } from './types';

export const getItem = (id: number) => api<ItemView>('GET', `/api/items/${id}`);

export const itemQuery = (id: number) => queryOptions({ queryKey: eventDayKeys.item(id), queryFn: () => getItem(id) });

export const useItem = (id: number) => useQuery(itemQuery(id));
