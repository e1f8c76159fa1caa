import type { KnowledgeQuery, SalvageFilter, SubstituteQuery } from '../../../../../shared/api/toolkit';

/** Every query key of the toolkit; invalidate a whole family by its prefix (`toolkitKeys.salvage.group(id)`). */
export const toolkitKeys = {
  all: ['toolkit'] as const,
  knowledge: {
    all: () => [...toolkitKeys.all, 'knowledge'] as const,
    search: (q: KnowledgeQuery) => [...toolkitKeys.knowledge.all(), 'search', q] as const,
    similar: (itemId: number) => [...toolkitKeys.knowledge.all(), 'similar', itemId] as const,
  },
  sharing: (groupId: number) => [...toolkitKeys.all, 'sharing', groupId] as const,
  salvage: {
    group: (groupId: number) => [...toolkitKeys.all, 'salvage', groupId] as const,
    list: (groupId: number, f: SalvageFilter) => [...toolkitKeys.salvage.group(groupId), 'list', f] as const,
    substitutes: (groupId: number, f: SubstituteQuery) =>
      [...toolkitKeys.salvage.group(groupId), 'substitutes', f] as const,
  },
};
