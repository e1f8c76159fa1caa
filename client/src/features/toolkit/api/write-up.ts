import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { KnowledgeEntry } from './types';
import type { WriteupInput } from '../../../../../shared/schemas/toolkit';
import { api } from '../../../lib/api';
import { toolkitKeys } from './keys';

export const writeUp = (itemId: number, body: WriteupInput) =>
  api<KnowledgeEntry>('PUT', `/api/knowledge/${itemId}/writeup`, body);

export function useWriteUp(itemId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: WriteupInput) => writeUp(itemId, body),
    onSuccess: () => qc.invalidateQueries({ queryKey: toolkitKeys.knowledge.all() }),
  });
}
