import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Barrier, Outcome } from '../../../../shared/event-day/constants';
import type { FollowUpStatus } from '../../../../shared/impact/follow-ups';
import type { ImpactTotals } from '../../../../shared/impact/statistics';
import { api } from '../../lib/api';

export interface StatsFilter {
  groupId?: number;
  eventId?: number;
  from?: string;
  to?: string;
}
export type Stats = ImpactTotals & { displacement: number; filter: StatsFilter };
export interface Method {
  displacement: number;
  displacementNote: string;
  factorSource: string;
  text: string[];
  categories: {
    id: number;
    name: string;
    avgWeightKg: number;
    weightSource: string;
    co2ePerKg: number | null;
    co2eSource: string | null;
  }[];
}
export interface RecordRow {
  itemId: number;
  eventId: number;
  eventTitle: string;
  eventStartsAt: string;
  groupName: string;
  categoryName: string;
  brand: string | null;
  model: string | null;
  fault: string;
  weighedKg: number | null;
  outcome: Outcome | null;
  barrier: Barrier | null;
  visitor: string;
  kg: number;
  outcomeLabel: string;
  barrierLabel: string | null;
}
export interface RecordsFilter extends StatsFilter {
  categoryId?: number;
  outcome?: Outcome | 'none';
  barrier?: Barrier;
  month?: string;
  page?: number;
}
export type PublicImpact = Omit<Stats, 'filter'> & {
  group: { name: string; town: string } | null;
  events: number;
  method: Method;
};
export interface EventReport {
  range?: { from: string | null; to: string | null; sessions: number };
  event: {
    id: number;
    title: string;
    startsAt: string;
    endsAt: string;
    groupId: number;
    groupName: string;
    timeZone: string;
  };
  stats: Stats;
  volunteers: { name: string; hours: number }[];
  volunteerHours: number;
  method: Method;
}
export interface FollowUp {
  itemId: number;
  status: FollowUpStatus;
  statusLabel: string;
  createdAt: string;
  mailedAt: string | null;
  remindedAt: string | null;
  returnItemId: number | null;
  note: string | null;
  ageDays: number;
  reminderDue: boolean;
  item: string;
  part: string | null;
  partLink: string | null;
  partCost: number | null;
  visitor: { name: string; email: string | null; phone: string | null; reference: string };
  event: { title: string; startsAt: string };
  rebookUrl: string | null;
  returnVisit: { reference: string; eventTitle: string | null; startsAt: string } | null;
}
export interface RebookView {
  item: { categoryName: string; brand: string | null; model: string | null; part: string | null };
  visitorName: string;
  group: { name: string; timeZone: string };
  status: FollowUpStatus;
  booked: boolean;
  events: {
    id: number;
    title: string;
    startsAt: string;
    endsAt: string;
    slots: { id: number; startsAt: string; endsAt: string; free: number }[];
  }[];
}

export const qs = (o: object) => {
  const p = new URLSearchParams();
  for (const [k, v] of Object.entries(o)) if (v !== undefined && v !== '' && v !== null) p.set(k, String(v));
  const s = p.toString();
  return s ? `?${s}` : '';
};

export const impactKeys = {
  stats: (f: StatsFilter) => ['stats', f] as const,
  records: (f: RecordsFilter) => ['stats-records', f] as const,
  method: ['stats-method'] as const,
  public: (groupId?: number) => ['public-impact', groupId ?? 0] as const,
  report: (eventId: number) => ['event-report', eventId] as const,
  followUps: (groupId: number) => ['follow-ups', groupId] as const,
  rebook: (token: string) => ['rebook', token] as const,
  settings: ['impact-settings'] as const,
};

export const useStats = (f: StatsFilter) =>
  useQuery({ queryKey: impactKeys.stats(f), queryFn: () => api<Stats>('GET', `/api/stats${qs(f)}`) });
export const useRecords = (f: RecordsFilter) =>
  useQuery({
    queryKey: impactKeys.records(f),
    queryFn: () => api<{ total: number; page: number; records: RecordRow[] }>('GET', `/api/stats/records${qs(f)}`),
  });
export const useMethod = () =>
  useQuery({
    queryKey: impactKeys.method,
    queryFn: () => api<Method>('GET', '/api/stats/method'),
    staleTime: 10 * 60_000,
  });
export const usePublicImpact = (groupId?: number) =>
  useQuery({
    queryKey: impactKeys.public(groupId),
    queryFn: () => api<PublicImpact>('GET', `/api/public/impact${qs({ groupId })}`),
  });
export const useEventReport = (eventId: number) =>
  useQuery({
    queryKey: impactKeys.report(eventId),
    queryFn: () => api<EventReport>('GET', `/api/events/${eventId}/report`),
  });
export const useGroupReport = (groupId: number, from?: string, to?: string) =>
  useQuery({
    queryKey: ['group-report', groupId, from ?? '', to ?? ''],
    queryFn: () => api<EventReport>('GET', `/api/groups/${groupId}/report${qs({ from, to })}`),
  });
export const useFollowUps = (groupId: number) =>
  useQuery({
    queryKey: impactKeys.followUps(groupId),
    queryFn: () => api<FollowUp[]>('GET', `/api/groups/${groupId}/follow-ups`),
  });
export const useRebook = (token: string) =>
  useQuery({ queryKey: impactKeys.rebook(token), queryFn: () => api<RebookView>('GET', `/api/rebook/${token}`) });
export const useImpactSettings = () =>
  useQuery({
    queryKey: impactKeys.settings,
    queryFn: () => api<{ displacement: number }>('GET', '/api/admin/impact-settings'),
  });

export const exportUrl = (kind: 'open-repair-data' | 'records', f: StatsFilter) => `/api/exports/${kind}.csv${qs(f)}`;

export function useSetFollowUp(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({
      itemId,
      status,
      note,
    }: {
      itemId: number;
      status: 'open' | 'part-ordered' | 'gave-up';
      note?: string;
    }) => api('PATCH', `/api/follow-ups/${itemId}`, { status, note }),
    onSuccess: () => qc.invalidateQueries({ queryKey: impactKeys.followUps(groupId) }),
  });
}
export function useBookReturn(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (slotId: number) =>
      api<{ reference: string; manageToken: string; eventId: number }>('POST', `/api/rebook/${token}`, { slotId }),
    onSuccess: () => qc.invalidateQueries({ queryKey: impactKeys.rebook(token) }),
  });
}
export function useSetImpactSettings() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (displacement: number) =>
      api<{ displacement: number }>('PUT', '/api/admin/impact-settings', { displacement }),
    onSuccess: () => qc.invalidateQueries(),
  });
}
