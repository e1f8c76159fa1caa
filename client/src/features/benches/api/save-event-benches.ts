import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Bench } from '../../../../../shared/api/benches';
import { api } from '../../../lib/api';
import { benchKeys } from './keys';

export const saveEventBenches = (eventId: number, benches: Bench[]) =>
  api<Bench[]>('PUT', `/api/events/${eventId}/benches`, { benches });

/** Removing a bench frees its fixers and items, so `onChanged` lets the page refresh the triage board. */
export function useSaveEventBenches(eventId: number, onChanged?: () => void) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (benches: Bench[]) => saveEventBenches(eventId, benches),
    onSuccess: (saved) => {
      qc.setQueryData(benchKeys.event(eventId), saved);
      onChanged?.();
    },
  });
}
