import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ImportJobView } from '../../../../../shared/api/imports';
import { api } from '../../../lib/api';
import { impactKeys } from './keys';

export const getImport = (id: number) => api<ImportJobView>('GET', `/api/imports/${id}`);

const working = (j?: ImportJobView) => j?.status === 'queued' || j?.status === 'running';

/** One import, asked again every second while it works. */
export const importQuery = (id: number) =>
  queryOptions({
    queryKey: impactKeys.import(id),
    queryFn: () => getImport(id),
    refetchInterval: (q) => (working(q.state.data) ? 1000 : false),
  });

export const useImport = (id: number | null) => useQuery({ ...importQuery(id ?? 0), enabled: id !== null });
