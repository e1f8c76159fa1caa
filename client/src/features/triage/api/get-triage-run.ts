import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { TriageRunDetail } from './types';
import { api } from '../../../lib/api';
import { triageKeys } from './keys';

export const getTriageRun = (eventId: number, runId: number) =>
  api<TriageRunDetail>('GET', `/api/events/${eventId}/triage-runs/${runId}`);

/** A stored run never changes, so it is read once. */
export const triageRunQuery = (eventId: number, runId: number) =>
  queryOptions({
    queryKey: triageKeys.run(eventId, runId),
    queryFn: () => getTriageRun(eventId, runId),
    staleTime: Infinity,
  });

export const useTriageRun = (eventId: number, runId: number) => useSuspenseQuery(triageRunQuery(eventId, runId));
