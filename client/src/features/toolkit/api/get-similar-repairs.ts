import { queryOptions, useQuery } from '@tanstack/react-query';
import type { KnowledgeEntry } from './types';
import { api } from '../../../lib/api';
import { toolkitKeys } from './keys';

export const getSimilarRepairs = (itemId: number) => api<KnowledgeEntry[]>('GET', `/api/items/${itemId}/similar`);

export const similarRepairsQuery = (itemId: number) =>
  queryOptions({ queryKey: toolkitKeys.knowledge.similar(itemId), queryFn: () => getSimilarRepairs(itemId) });

export const useSimilarRepairs = (itemId: number) => useQuery(similarRepairsQuery(itemId));
