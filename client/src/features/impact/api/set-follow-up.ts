import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FollowUpChange } from '../../../../../shared/api/impact';
import { api } from '../../../lib/api';
import { impactKeys } from './keys';

export interface FollowUpPatch {
  itemId: number;
  status: FollowUpChange;
  note?: string;
}

export const setFollowUp = ({ itemId, status, note }: FollowUpPatch) =>
  api<void>('PATCH', `/api/follow-ups/${itemId}`, { status, note });

export function useSetFollowUp(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: setFollowUp,
    onSuccess: () => qc.invalidateQueries({ queryKey: impactKeys.followUps(groupId) }),
  });
}
