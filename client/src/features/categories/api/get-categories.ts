import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { Category } from '../../../../../shared/api/categories';
import { api } from '../../../lib/api';
import { categoryKeys } from './keys';

export const getCategories = () => api<Category[]>('GET', '/api/categories');

/** The kinds of item change rarely (an admin's edit), so five minutes fresh is plenty. */
export const categoriesQuery = () =>
  queryOptions({ queryKey: categoryKeys.list(), queryFn: getCategories, staleTime: 5 * 60_000 });

export const useCategories = () => useSuspenseQuery(categoriesQuery());
