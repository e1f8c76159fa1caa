import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RebookView } from './types';
import { api } from '../../../lib/api';

import { impactKeys } from './keys';

export const getRebook = (token: string) => api<RebookView>('GET', `/api/rebook/${token}`);

export const rebookQuery = (token: string) =>
  queryOptions({ queryKey: impactKeys.rebook(token), queryFn: () => getRebook(token) });

export const useRebook = (token: string) => useQuery(rebookQuery(token));
