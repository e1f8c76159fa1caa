import { queryOptions, useQuery } from '@tanstack/react-query';
import type { KnowledgeQuery } from '../../../../../shared/api/toolkit';
import type { KnowledgeEntry } from './types';
import { api } from '../../../lib/api';
import { queryString } from '../../../lib/query-string';
import { toolkitKeys } from './keys';

export const getKnowledge = (q: KnowledgeQuery) => api<KnowledgeEntry[]>('GET', `/api/knowledge${queryString(q)}`);

export const knowledgeQuery = (q: KnowledgeQuery) =>
  queryOptions({ queryKey: toolkitKeys.knowledge.search(q), queryFn: () => getKnowledge(q) });

/** The search runs only once something is asked (`enabled`). */
export const useKnowledge = (q: KnowledgeQuery, enabled = true) => useQuery({ ...knowledgeQuery(q), enabled });
