import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Outcome } from '../../../../shared/event-day/constants';
import type { PartRatings, PartType } from '../../../../shared/salvage/constants';
import type { SubstituteVerdict } from '../../../../shared/salvage/match';
import type { SalvagePartInput } from '../../../../shared/schemas/toolkit';
import { api } from '../../lib/api';
import { qs } from '../impact/api';
import { eventDayKeys } from '../event-day/api';

export interface KnowledgeEntry {
  itemId: number;
  groupName: string;
  categoryId: number;
  categoryName: string;
  brand: string;
  model: string;
  outcome: Outcome;
  outcomeLabel: string;
  symptom: string;
  notes: string;
  measured: string;
  faultyPart: string;
  fix: string;
  writtenUp: boolean;
  eventDate: string;
  score: number;
  photoIds: number[];
}
export interface KnowledgeQuery {
  q?: string;
  categoryId?: number;
  brand?: string;
  model?: string;
  scope?: 'mine' | 'network';
}
export interface SalvagePart {
  id: number;
  groupId: number;
  type: PartType;
  typeLabel: string;
  value: string;
  ratings: PartRatings;
  package: string;
  pinout: string;
  quantity: number;
  box: string;
  sourceItemId: number | null;
  notes: string;
  createdAt: string;
}
export interface Substitute {
  part: SalvagePart;
  verdict: SubstituteVerdict;
}

export const toolkitKeys = {
  knowledge: (q: KnowledgeQuery) => ['knowledge', q] as const,
  similar: (itemId: number) => ['similar', itemId] as const,
  salvage: (groupId: number, f: object) => ['salvage', groupId, f] as const,
  substitutes: (groupId: number, f: object) => ['substitutes', groupId, f] as const,
  sharing: (groupId: number) => ['knowledge-sharing', groupId] as const,
};

export const useKnowledge = (q: KnowledgeQuery, enabled = true) =>
  useQuery({
    queryKey: toolkitKeys.knowledge(q),
    queryFn: () => api<KnowledgeEntry[]>('GET', `/api/knowledge${qs(q)}`),
    enabled,
  });
export const useSimilar = (itemId: number) =>
  useQuery({
    queryKey: toolkitKeys.similar(itemId),
    queryFn: () => api<KnowledgeEntry[]>('GET', `/api/items/${itemId}/similar`),
  });
export const useSalvage = (groupId: number, f: { type?: PartType; q?: string; inStock?: '1' }) =>
  useQuery({
    queryKey: toolkitKeys.salvage(groupId, f),
    queryFn: () => api<SalvagePart[]>('GET', `/api/groups/${groupId}/salvage${qs(f)}`),
  });
export const useSubstitutes = (
  groupId: number,
  f: { type: PartType } & PartRatings & { package?: string },
  enabled: boolean,
) =>
  useQuery({
    queryKey: toolkitKeys.substitutes(groupId, f),
    queryFn: () => api<Substitute[]>('GET', `/api/groups/${groupId}/salvage/substitutes${qs(f)}`),
    enabled,
  });
export const useSharing = (groupId: number) =>
  useQuery({
    queryKey: toolkitKeys.sharing(groupId),
    queryFn: () => api<{ share: boolean }>('GET', `/api/groups/${groupId}/knowledge-sharing`),
  });

export function useSetSharing(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (share: boolean) =>
      api<{ share: boolean }>('PUT', `/api/groups/${groupId}/knowledge-sharing`, { share }),
    onSuccess: (d) => qc.setQueryData(toolkitKeys.sharing(groupId), d),
  });
}
export function useAddPart(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SalvagePartInput) => api<SalvagePart>('POST', `/api/groups/${groupId}/salvage`, body),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['salvage', groupId] }),
  });
}
export function useTakePart(groupId: number, itemId?: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (partId: number) => api<SalvagePart>('POST', `/api/salvage/${partId}/take`, { itemId }),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: ['salvage', groupId] });
      void qc.invalidateQueries({ queryKey: ['substitutes', groupId] });
      if (itemId) void qc.invalidateQueries({ queryKey: eventDayKeys.item(itemId) });
    },
  });
}
export function useUpdatePart(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...patch }: { id: number; quantity?: number; box?: string }) =>
      api<SalvagePart>('PATCH', `/api/salvage/${id}`, patch),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['salvage', groupId] }),
  });
}
export function useRemovePart(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api('DELETE', `/api/salvage/${id}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['salvage', groupId] }),
  });
}
export function useWriteUp(itemId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: { symptom: string; measured: string; faultyPart: string; fix: string }) =>
      api<KnowledgeEntry>('PUT', `/api/knowledge/${itemId}/writeup`, body),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['knowledge'] }),
  });
}
