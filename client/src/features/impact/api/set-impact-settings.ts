import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImpactSettings } from './types';
import { api } from '../../../lib/api';

export const setImpactSettings = (displacement: number) =>
  api<ImpactSettings>('PUT', '/api/admin/impact-settings', { displacement });

/** The displacement rate changes every estimate on every page, so everything is fetched afresh. */
export function useSetImpactSettings() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: setImpactSettings, onSuccess: () => qc.invalidateQueries() });
}
