import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { EventStatus, Skill } from '../../../../../shared/constants';
import { api } from '../../../lib/api';

export interface EventSummary {
  id: number;
  groupId: number;
  groupName: string;
  title: string;
  description: string;
  status: EventStatus;
  startsAt: string;
  endsAt: string;
  slotMinutes: number;
  slotCapacity: number;
  skillLimits: Partial<Record<Skill, number>>;
  timeZone: string;
  venue: { id: number; name: string; address: string; town: string; accessNotes: string };
  totalPlaces: number;
  freePlaces: number;
}
export interface Slot {
  id: number;
  startsAt: string;
  endsAt: string;
  capacity: number;
  booked: number;
  held: number;
  free: number;
  skillTaken: Partial<Record<Skill, number>>;
}
export interface EventDetail extends EventSummary {
  houseRules: string;
  excludedCategoryIds: number[];
  slots: Slot[];
}
export interface Category {
  id: number;
  slug: string;
  name: string;
  weeeCategory: number | null;
  avgWeightKg: number;
  weightSource: string;
  co2ePerKg: number | null;
  co2eSource: string | null;
  skill: Skill;
  equipment: string[];
  repairMinutes: number;
  mains: boolean;
  refusal: { reason: string; suggestion: string } | null;
}

export interface EventFilters {
  groupId?: number;
  categoryId?: number;
}

export const eventKeys = {
  all: ['events'] as const,
  list: (f: EventFilters) => ['events', 'list', f] as const,
  detail: (id: number) => ['events', 'detail', id] as const,
  group: (groupId: number) => ['events', 'group', groupId] as const,
  bookings: (id: number) => ['events', 'bookings', id] as const,
};

const qs = (o: Record<string, unknown>) => {
  const p = new URLSearchParams();
  for (const [k, v] of Object.entries(o)) if (v !== undefined && v !== '') p.set(k, String(v));
  const s = p.toString();
  return s ? `?${s}` : '';
};

export const useEvents = (f: EventFilters) =>
  useQuery({
    queryKey: eventKeys.list(f),
    queryFn: () =>
      api<EventSummary[]>('GET', `/api/events${qs({ ...f, from: new Date(Date.now() - 86400_000).toISOString() })}`),
  });
export const eventQuery = (id: number) =>
  queryOptions({ queryKey: eventKeys.detail(id), queryFn: () => api<EventDetail>('GET', `/api/events/${id}`) });
export const useEvent = (id: number) => useQuery({ ...eventQuery(id), enabled: id > 0 });
export const useGroupEvents = (groupId: number) =>
  useQuery({
    queryKey: eventKeys.group(groupId),
    queryFn: () => api<EventSummary[]>('GET', `/api/groups/${groupId}/events`),
  });
export const useCategories = () =>
  useQuery({
    queryKey: ['categories'],
    queryFn: () => api<Category[]>('GET', '/api/categories'),
    staleTime: 5 * 60_000,
  });

export function useCreateEvent() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: Record<string, unknown>) => api<EventDetail>('POST', '/api/events', input),
    onSuccess: (e) => {
      qc.setQueryData(eventKeys.detail(e.id), e);
      qc.invalidateQueries({ queryKey: eventKeys.all });
    },
  });
}

/** Every organiser action on one event answers the event again; the cache takes it as it is. */
export function useEventAction(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ method, path, body }: { method: 'POST' | 'PATCH' | 'DELETE'; path: string; body?: unknown }) =>
      api<EventDetail>(method, `/api/events/${id}${path}`, body),
    onSuccess: (e) => {
      qc.setQueryData(eventKeys.detail(id), e);
      qc.invalidateQueries({ queryKey: eventKeys.all });
    },
  });
}
