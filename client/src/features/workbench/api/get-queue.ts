import { queryOptions, useQuery } from '@tanstack/react-query';
import type { QueueItem } from './types';
import { api } from '../../../lib/api';
import { workbenchKeys } from './keys';

export const getQueue = () => api<QueueItem[]>('GET', '/api/me/queue');

export const queueQuery = () => queryOptions({ queryKey: workbenchKeys.queue(), queryFn: getQueue });

/** Triage and the desk move items while the fixer watches, so the queue refreshes on its own. */
export const useQueue = () => useQuery({ ...queueQuery(), refetchInterval: 30_000 });
