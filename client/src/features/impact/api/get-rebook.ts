import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { RebookView } from './types';
import { api } from '../../../lib/api';

import { impactKeys } from './keys';

export const getRebook = (token: string) => api<RebookView>('GET', `/api/rebook/${token}`);

export const rebookQuery = (token: string) =>
  queryOptions({ queryKey: impactKeys.rebook(token), queryFn: () => getRebook(token) });

/** Read after the route's loader has the link's view, so the page renders with it from the start. */
export const useRebook = (token: string) => useSuspenseQuery(rebookQuery(token));
