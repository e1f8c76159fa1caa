import type { ItemStatus } from '../../../../../shared/event-day/constants';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ProfileInput } from '../../../../../shared/schemas/skills';
import { api } from '../../../lib/api';

export interface Profile {
  skills: Record<string, 1 | 2 | 3>;
  kit: string[];
  notes: string;
}
export interface MyEvent {
  id: number;
  title: string;
  startsAt: string;
  endsAt: string;
  status: string;
  groupName: string;
  timeZone: string;
  shift: { coming: boolean; startsAt: string; endsAt: string } | null;
}
export interface QueueItem {
  itemId: number;
  status: ItemStatus;
  tagCode: string | null;
  queueNumber: number | null;
  eventId: number;
  eventTitle: string;
  timeZone: string;
  slotStartsAt: string;
  reference: string;
  visitorName: string;
  categoryName: string;
  minutes: number;
  brand: string | null;
  model: string | null;
  fault: string;
  mains: boolean;
  benchName: string;
  photoIds: number[];
}
export interface Matrix {
  skills: string[];
  volunteers: {
    userId: number;
    name: string;
    email: string;
    roles: string[];
    skills: Record<string, number>;
    kit: string[];
    notes: string;
  }[];
}

export const useProfile = () =>
  useQuery({ queryKey: ['me', 'profile'], queryFn: () => api<Profile>('GET', '/api/me/profile') });
export function useSaveProfile() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (p: ProfileInput) => api<Profile>('PUT', '/api/me/profile', p),
    onSuccess: (p) => qc.setQueryData(['me', 'profile'], p),
  });
}
export const useMyEvents = () =>
  useQuery({ queryKey: ['me', 'events'], queryFn: () => api<MyEvent[]>('GET', '/api/me/events') });
export function useSetShift() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ eventId, ...body }: { eventId: number; coming: boolean; startsAt?: string; endsAt?: string }) =>
      api('PUT', `/api/events/${eventId}/shifts/me`, body),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['me', 'events'] }),
  });
}
export const myQueueKey = ['me', 'queue'] as const;
export const useQueue = () =>
  useQuery({
    queryKey: myQueueKey,
    queryFn: () => api<QueueItem[]>('GET', '/api/me/queue'),
    refetchInterval: 30_000,
  });
export const useSkillsMatrix = (groupId: number) =>
  useQuery({
    queryKey: ['groups', groupId, 'skills'],
    queryFn: () => api<Matrix>('GET', `/api/groups/${groupId}/skills`),
  });
