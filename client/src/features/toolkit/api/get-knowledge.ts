import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { KnowledgeQuery } from '../../../../../shared/api/toolkit';
import type { KnowledgeEntry } from './types';
import { api } from '../../../lib/api';
import { queryString } from '../../../lib/query-string';
import { toolkitKeys } from './keys';

export const getKnowledge = (q: KnowledgeQuery) => api<KnowledgeEntry[]>('GET', `/api/knowledge${queryString(q)}`);

export const knowledgeQuery = (q: KnowledgeQuery) =>
  queryOptions({ queryKey: toolkitKeys.knowledge.search(q), queryFn: () => getKnowledge(q) });

/** Read after the route's loader has searched, so the results render with the page. */
export const useKnowledge = (q: KnowledgeQuery) => useSuspenseQuery(knowledgeQuery(q));
