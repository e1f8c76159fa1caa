import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ImportJobView } from '../../../../../shared/api/imports';
import { api } from '../../../lib/api';
import { impactKeys } from './keys';

export const getImports = (groupId: number) => api<ImportJobView[]>('GET', `/api/imports?groupId=${groupId}`);

export const importsQuery = (groupId: number) =>
  queryOptions({ queryKey: impactKeys.imports(groupId), queryFn: () => getImports(groupId) });

/** The group's last ten imports, newest first. */
export const useImports = (groupId: number) => useQuery(importsQuery(groupId));
