import { queryOptions, useQuery, useSuspenseQuery } from '@tanstack/react-query';
import type { Category } from '../../../../../shared/api/categories';
import { api } from '../../../lib/api';
import { categoryKeys } from './keys';

const getCategories = () => api<Category[]>('GET', '/api/categories');

/** The kinds of item change rarely (an admin's edit), so five minutes fresh is plenty. */
export const categoriesQuery = () =>
  queryOptions({ queryKey: categoryKeys.list(), queryFn: getCategories, staleTime: 5 * 60_000 });

/** For a page whose loader warmed the list. */
export const useCategories = () => useSuspenseQuery(categoriesQuery());

/** For a page that shows its own spinner while the list loads. */
export const useCategoriesQuery = () => useQuery(categoriesQuery());
