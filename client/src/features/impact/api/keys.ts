import type { RecordsFilter, StatsFilter } from '../../../../../shared/api/impact';

/** Every query key of the impact feature; `impactKeys.all` is the prefix of them all. */
export const impactKeys = {
  all: ['impact'] as const,
  stats: (f: StatsFilter) => [...impactKeys.all, 'stats', f] as const,
  records: (f: RecordsFilter) => [...impactKeys.all, 'records', f] as const,
  method: () => [...impactKeys.all, 'method'] as const,
  public: (groupId?: number) => [...impactKeys.all, 'public', groupId ?? 0] as const,
  eventReport: (eventId: number) => [...impactKeys.all, 'report', 'event', eventId] as const,
  groupReport: (groupId: number, from?: string, to?: string) =>
    [...impactKeys.all, 'report', 'group', groupId, from ?? '', to ?? ''] as const,
  sessionFigures: (groupId: number) => [...impactKeys.all, 'session-figures', groupId] as const,
  followUps: (groupId: number) => [...impactKeys.all, 'follow-ups', groupId] as const,
  rebook: (token: string) => [...impactKeys.all, 'rebook', token] as const,
  settings: () => [...impactKeys.all, 'settings'] as const,
  imports: (groupId: number) => [...impactKeys.all, 'imports', groupId] as const,
  import: (id: number) => [...impactKeys.all, 'import', id] as const,
};
