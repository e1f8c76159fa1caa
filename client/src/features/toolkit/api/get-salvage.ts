import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { SalvageFilter } from '../../../../../shared/api/toolkit';
import type { SalvagePart } from './types';
import { api } from '../../../lib/api';
import { queryString } from '../../../lib/query-string';
import { toolkitKeys } from './keys';

export const getSalvage = (groupId: number, f: SalvageFilter) =>
  api<SalvagePart[]>('GET', `/api/groups/${groupId}/salvage${queryString(f)}`);

export const salvageQuery = (groupId: number, f: SalvageFilter) =>
  queryOptions({ queryKey: toolkitKeys.salvage.list(groupId, f), queryFn: () => getSalvage(groupId, f) });

/** Read after the route's loader has the list for these filters (it runs again when they change). */
export const useSalvage = (groupId: number, f: SalvageFilter) => useSuspenseQuery(salvageQuery(groupId, f));
