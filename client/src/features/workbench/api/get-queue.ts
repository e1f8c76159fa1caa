import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { QueueItem } from './types';
import { api } from '../../../lib/api';
import { workbenchKeys } from './keys';

export const getQueue = () => api<QueueItem[]>('GET', '/api/me/queue');

export const queueQuery = () => queryOptions({ queryKey: workbenchKeys.queue(), queryFn: getQueue });

/**
 * Read after the route's loader has the queue. Triage and the desk move items while the fixer watches, so the
 * queue refreshes on its own.
 */
export const useQueue = () => useSuspenseQuery({ ...queueQuery(), refetchInterval: 30_000 });
