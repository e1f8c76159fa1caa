import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { ItemStatus, Outcome, Barrier } from '../../../../shared/event-day/constants';
import type { CheckInInput, OutcomeInput, SafetyCheckInput, WalkInInput } from '../../../../shared/schemas/event-day';
import type { Caution } from '../../../../shared/safety/cautions';
import { api, ApiError } from '../../lib/api';

export interface DeskEvent {
  id: number;
  title: string;
  startsAt: string;
  endsAt: string;
  status: string;
  groupId: number;
  groupName: string;
  timeZone: string;
  open: boolean;
}
export interface DeskItem {
  id: number;
  categoryId: number;
  categoryName: string;
  brand: string | null;
  model: string | null;
  fault: string;
  mains: boolean;
  status: ItemStatus;
  tagCode: string | null;
  queueNumber: number | null;
  weighedKg: number | null;
  checkedInAt: string | null;
}
export interface DeskBooking {
  id: number;
  reference: string;
  visitorName: string;
  visitorPhone: string | null;
  walkIn: boolean;
  slotId: number;
  items: DeskItem[];
}
export interface Desk {
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
  open: boolean;
  currentSlotId: number | null;
  slots: { id: number; startsAt: string; endsAt: string; bookings: DeskBooking[] }[];
}
export interface Issued {
  id: number;
  tagCode: string | null;
  queueNumber: number | null;
  status: ItemStatus;
}

export interface SafetyCheck {
  id: number;
  pass: boolean;
  failures: string[];
  applianceClass: 'I' | 'II' | 'III';
  readings: Record<string, unknown>;
  instrument: string | null;
  createdAt: string;
  checkedByName: string | null;
}
export interface ItemDetail {
  id: number;
  status: ItemStatus;
  statusLabel: string;
  tagCode: string | null;
  queueNumber: number | null;
  categoryId: number;
  categoryName: string;
  skill: string;
  mains: boolean;
  battery: boolean;
  heating: boolean;
  brand: string | null;
  model: string | null;
  ageYears: number | null;
  fault: string;
  weighedKg: number | null;
  estimatedMinutes: number;
  checkedInAt: string | null;
  startedAt: string | null;
  doneAt: string | null;
  photos: { id: number; kind: 'intake' | 'repair'; width: number; height: number }[];
  booking: {
    reference: string;
    visitorName: string;
    visitorPhone: string | null;
    walkIn: boolean;
    slotStartsAt: string;
    slotEndsAt: string;
  };
  event: {
    id: number;
    title: string;
    groupId: number;
    groupName: string;
    timeZone: string;
    startsAt: string;
    endsAt: string;
  };
  placement: { userId: number; benchId: number; fixerName: string; benchName: string; startsAt: string | null } | null;
  outcome: null | {
    outcome: Outcome;
    outcomeLabel: string;
    barrier: Barrier | null;
    barrierLabel: string | null;
    partDescription: string | null;
    partLink: string | null;
    partCost: number | null;
    minutes: number | null;
    notes: string | null;
    recordedAt: string;
    recordedByName: string | null;
  };
  safetyChecks: SafetyCheck[];
  history: {
    from: ItemStatus | null;
    to: ItemStatus;
    toLabel: string;
    at: string;
    byName: string | null;
    note: string | null;
  }[];
  partsUsed: {
    id: number;
    quantity: number;
    createdAt: string;
    type: string;
    value: string;
    package: string;
    box: string;
    takenBy: string | null;
  }[];
  returnOfItemId: number | null;
  cautions: Caution[];
  safetyNote: string;
  safetySource: string;
  can: { start: boolean; record: boolean };
}

export interface HallQueue {
  event: { id: number; title: string; groupName: string; timeZone: string; startsAt: string; endsAt: string };
  serving: { queueNumber: number | null; benchName: string | null }[];
  waiting: { queueNumber: number | null; waitMinutes: number | null }[];
  done: number;
  fixersOnHand: number;
  updatedAt: string;
}
export interface LiveCard {
  id: number;
  queueNumber: number | null;
  tagCode: string | null;
  label: string;
  visitor: string;
  status: ItemStatus;
  fixerName: string | null;
  checkedInAt: string | null;
  startedAt: string | null;
  doneAt: string | null;
  outcomeLabel: string | null;
  waitedMinutes: number | null;
  estimatedWaitMinutes: number | null;
}
export interface LiveView {
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
  counts: Record<ItemStatus, number>;
  benches: { id: number; name: string; atBench: LiveCard[]; waiting: LiveCard[]; done: LiveCard[] }[];
  unplaced: LiveCard[];
  fixers: { userId: number; name: string; busy: boolean }[];
  warnings: { kind: 'long-wait' | 'idle-fixer'; itemId?: number; userId?: number; message: string }[];
  updatedAt: string;
}
export interface Tag {
  itemId: number;
  tagCode: string;
  url: string;
  qrSvg: string;
  queueNumber: number | null;
  categoryName: string;
  mains: boolean;
  visitor: string;
  slotStartsAt: string;
  benchName: string | null;
}
export interface TagSheet {
  event: { id: number; title: string; groupName: string; timeZone: string };
  tags: Tag[];
}
export interface PublicTag {
  tagCode: string;
  itemId: number;
  groupId: number;
  groupName: string;
  eventId: number;
  eventTitle: string;
  categoryName: string;
  status: ItemStatus;
  statusLabel: string;
  queueNumber: number | null;
  outcomeLabel: string | null;
  waitMinutes: number | null;
}

export const eventDayKeys = {
  deskEvents: ['desk-events'] as const,
  desk: (eventId: number) => ['desk', eventId] as const,
  item: (id: number) => ['item', id] as const,
  hall: (eventId: number) => ['hall', eventId] as const,
  live: (eventId: number) => ['live', eventId] as const,
  tags: (eventId: number, q: string) => ['tags', eventId, q] as const,
  tag: (code: string) => ['tag', code] as const,
};

export const useDeskEvents = () =>
  useQuery({ queryKey: eventDayKeys.deskEvents, queryFn: () => api<DeskEvent[]>('GET', '/api/desk/events') });
export const useDesk = (eventId: number) =>
  useQuery({
    queryKey: eventDayKeys.desk(eventId),
    queryFn: () => api<Desk>('GET', `/api/events/${eventId}/desk`),
    refetchInterval: 20_000,
  });
export const useItem = (id: number) =>
  useQuery({ queryKey: eventDayKeys.item(id), queryFn: () => api<ItemDetail>('GET', `/api/items/${id}`) });
/** The TV refreshes by itself every 10 seconds and keeps showing the last answer while the network is away. */
export const useHallQueue = (eventId: number) =>
  useQuery({
    queryKey: eventDayKeys.hall(eventId),
    queryFn: () => api<HallQueue>('GET', `/api/public/events/${eventId}/queue`),
    refetchInterval: 10_000,
    staleTime: 0,
  });
export const useLiveView = (eventId: number) =>
  useQuery({
    queryKey: eventDayKeys.live(eventId),
    queryFn: () => api<LiveView>('GET', `/api/events/${eventId}/live`),
    refetchInterval: 15_000,
    staleTime: 0,
  });
export const useTagSheet = (eventId: number, q: { slotId?: number; items?: number[] }) => {
  const qs = q.slotId ? `?slotId=${q.slotId}` : q.items?.length ? `?items=${q.items.join(',')}` : '';
  return useQuery({
    queryKey: eventDayKeys.tags(eventId, qs),
    queryFn: () => api<TagSheet>('GET', `/api/events/${eventId}/tags${qs}`),
  });
};
export const usePublicTag = (code: string) =>
  useQuery({
    queryKey: eventDayKeys.tag(code),
    queryFn: () => api<PublicTag>('GET', `/api/public/tags/${code}`),
    refetchInterval: 30_000,
  });

export function useCheckIn(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ reference, body }: { reference: string; body: CheckInInput }) =>
      api<{ items: Issued[] }>('POST', `/api/bookings/${reference}/check-in`, body),
    onSuccess: () => qc.invalidateQueries({ queryKey: eventDayKeys.desk(eventId) }),
  });
}
export function useWalkIn(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: WalkInInput) =>
      api<{ reference: string; items: Issued[] }>('POST', `/api/events/${eventId}/walk-ins`, body),
    onSuccess: () => qc.invalidateQueries({ queryKey: eventDayKeys.desk(eventId) }),
  });
}
export function useStartRepair(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<ItemDetail>('POST', `/api/items/${id}/start`, {}),
    onSuccess: (d) => qc.setQueryData(eventDayKeys.item(id), d),
  });
}
export function useSafetyCheck(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SafetyCheckInput) =>
      api<{ id: number; pass: boolean; failures: string[]; missing: string[]; suggestion: string | null }>(
        'POST',
        `/api/items/${id}/safety-checks`,
        body,
      ),
    onSuccess: () => qc.invalidateQueries({ queryKey: eventDayKeys.item(id) }),
  });
}

/**
 * The outcome is the one write a fixer makes with poor Wi-Fi: its mutation has a key and default function so a
 * paused one (offline) survives a reload in the persisted cache and is sent when the connection returns.
 */
export const OUTCOME_MUTATION_KEY = ['item-outcome'] as const;
export interface OutcomeVariables {
  itemId: number;
  body: OutcomeInput;
}
export const sendOutcome = ({ itemId, body }: OutcomeVariables) =>
  api<ItemDetail>('POST', `/api/items/${itemId}/outcome`, body);

export function useRepairPhotos(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (files: FileList) => {
      const form = new FormData();
      for (const f of Array.from(files)) form.append('photos', f);
      return api<{ id: number }[]>('POST', `/api/items/${id}/photos`, form);
    },
    onSuccess: () => qc.invalidateQueries({ queryKey: eventDayKeys.item(id) }),
  });
}

/**
 * A fixer's outcome recorded with no connection waits in the mutation cache (paused) and is sent when the browser
 * is back online. The default function lets a paused outcome restored after a reload be sent too; a dropped
 * request (status 0) is retried rather than lost. Recording an outcome twice stores the same thing. The app passes
 * `onRecorded` for what other features show of the item (the fixer's queue).
 */
export function registerOutcomeWrites(queryClient: QueryClient, onRecorded: () => void) {
  queryClient.setMutationDefaults(OUTCOME_MUTATION_KEY, {
    mutationFn: sendOutcome,
    onSuccess: (item: ItemDetail) => {
      queryClient.setQueryData(eventDayKeys.item(item.id), item);
      onRecorded();
    },
    retry: (count, err) => err instanceof ApiError && err.status === 0 && count < 20,
    retryDelay: (n) => Math.min(30_000, 1000 * 2 ** n),
  });
}
