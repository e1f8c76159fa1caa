import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { PublicTag } from './types';

export const getPublicTag = (code: string) => api<PublicTag>('GET', `/api/public/tags/${encodeURIComponent(code)}`);

/** The visitor's view of their item refreshes every 30 seconds. */
export const publicTagQuery = (code: string) =>
  queryOptions({ queryKey: eventDayKeys.tag(code), queryFn: () => getPublicTag(code), refetchInterval: 30_000 });

export const usePublicTag = (code: string) => useQuery(publicTagQuery(code));
