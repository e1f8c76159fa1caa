import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';

export interface BoardItem {
  id: number;
  reference: string;
  visitorName: string;
  bookedAt: string;
  slotId: number;
  categoryName: string;
  brand: string | null;
  model: string | null;
  fault: string;
  mains: boolean;
  minutes: number;
  needs: { skill: string; minLevel: number; equipment: string[] };
  photoIds: number[];
  placement: {
    userId: number;
    benchId: number;
    locked: boolean;
    source: 'engine' | 'hand';
    startsAt: string | null;
  } | null;
  warnings: { code: string; message: string }[];
  reason: { reason: string; detail: string } | null;
  estimatedStart: string | null;
}
export interface Board {
  event: {
    id: number;
    title: string;
    status: string;
    startsAt: string;
    endsAt: string;
    groupId: number;
    groupName: string;
    timeZone: string;
  };
  slots: { id: number; startsAt: string; endsAt: string }[];
  benches: { id: number; name: string; seats: number; equipment: string[] }[];
  fixers: {
    userId: number;
    name: string;
    startsAt: string;
    endsAt: string;
    benchId: number | null;
    skills: Record<string, number>;
  }[];
  items: BoardItem[];
  runs: {
    id: number;
    slotId: number | null;
    createdAt: string;
    assigned: number;
    unassigned: number;
    lockedKept: number;
  }[];
}
export interface Rota {
  slots: { id: number; startsAt: string; endsAt: string; demand: Record<string, number> }[];
  shifts: {
    userId: number;
    name: string;
    coming: boolean;
    startsAt: string;
    endsAt: string;
    benchId: number | null;
    skills: Record<string, number>;
  }[];
  coverage: { startsAt: string; endsAt: string; bySkill: Record<string, number>; fixers: number }[];
  gaps: { skill: string; from: string; to: string; items: number }[];
}
export interface Bench {
  id?: number;
  name: string;
  seats: number;
  equipment: string[];
}

const key = (id: number) => ['events', 'board', id] as const;
export const useBoard = (eventId: number) =>
  useQuery({ queryKey: key(eventId), queryFn: () => api<Board>('GET', `/api/events/${eventId}/board`) });
export function useBoardAction(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ method, path, body }: { method: 'POST' | 'PUT' | 'DELETE'; path: string; body?: unknown }) =>
      api<{ warnings?: { code: string; message: string }[]; assigned?: number; unassigned?: number }>(
        method,
        `/api/events/${eventId}${path}`,
        body,
      ),
    onSuccess: () => qc.invalidateQueries({ queryKey: key(eventId) }),
  });
}
export const useRota = (eventId: number) =>
  useQuery({ queryKey: ['events', 'rota', eventId], queryFn: () => api<Rota>('GET', `/api/events/${eventId}/rota`) });
export const useAskForSkills = (eventId: number) =>
  useMutation({
    mutationFn: (skills: string[]) => api<{ sent: number }>('POST', `/api/events/${eventId}/rota/ask`, { skills }),
  });
export function useSeat(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, benchId }: { userId: number; benchId: number | null }) =>
      api('PATCH', `/api/events/${eventId}/shifts/${userId}`, { benchId }),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: ['events', 'rota', eventId] });
      qc.invalidateQueries({ queryKey: key(eventId) });
    },
  });
}
export const useEventBenches = (eventId: number) =>
  useQuery({
    queryKey: ['events', 'benches', eventId],
    queryFn: () => api<Bench[]>('GET', `/api/events/${eventId}/benches`),
  });
export function useSaveBenches(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (benches: Bench[]) => api<Bench[]>('PUT', `/api/events/${eventId}/benches`, { benches }),
    onSuccess: (b) => {
      qc.setQueryData(['events', 'benches', eventId], b);
      qc.invalidateQueries({ queryKey: key(eventId) });
    },
  });
}
