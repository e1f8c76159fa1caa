import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SafetyCheckInput } from '../../../../../shared/schemas/event-day';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';
import type { SafetyCheckResult } from './types';

export const recordSafetyCheck = (id: number, body: SafetyCheckInput) =>
  api<SafetyCheckResult>('POST', `/api/items/${id}/safety-checks`, body);

export function useRecordSafetyCheck(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SafetyCheckInput) => recordSafetyCheck(id, body),
    onSuccess: () => qc.invalidateQueries({ queryKey: eventDayKeys.item(id) }),
  });
}
