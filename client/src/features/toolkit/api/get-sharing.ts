import { queryOptions, useQuery } from '@tanstack/react-query';
import type { KnowledgeSharing } from './types';
import { api } from '../../../lib/api';
import { toolkitKeys } from './keys';

export const getSharing = (groupId: number) => api<KnowledgeSharing>('GET', `/api/groups/${groupId}/knowledge-sharing`);

export const sharingQuery = (groupId: number) =>
  queryOptions({ queryKey: toolkitKeys.sharing(groupId), queryFn: () => getSharing(groupId) });

export const useSharing = (groupId: number) => useQuery(sharingQuery(groupId));
