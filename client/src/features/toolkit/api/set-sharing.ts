import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { KnowledgeSharing } from './types';
import { api } from '../../../lib/api';
import { toolkitKeys } from './keys';

export const setSharing = (groupId: number, share: boolean) =>
  api<KnowledgeSharing>('PUT', `/api/groups/${groupId}/knowledge-sharing`, { share });

export function useSetSharing(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (share: boolean) => setSharing(groupId, share),
    onSuccess: (d) => qc.setQueryData(toolkitKeys.sharing(groupId), d),
  });
}
