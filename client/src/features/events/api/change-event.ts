import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EventDetail } from '../../../../../shared/api/events';
import { api } from '../../../lib/api';
import { eventKeys } from './keys';

/** What an organiser can do to one session from its page. */
type EventChange =
  | { kind: 'publish' }
  | { kind: 'close' }
  | { kind: 'cancel'; reason?: string }
  | { kind: 'set-capacity'; slotId: number; capacity: number }
  | { kind: 'remove-slot'; slotId: number };

function changeEvent(id: number, change: EventChange) {
  const base = `/api/events/${id}`;
  switch (change.kind) {
    case 'set-capacity':
      return api<EventDetail>('PATCH', `${base}/slots/${change.slotId}`, { capacity: change.capacity });
    case 'remove-slot':
      return api<EventDetail>('DELETE', `${base}/slots/${change.slotId}`);
    case 'cancel':
      return api<EventDetail>('POST', `${base}/cancel`, change.reason ? { reason: change.reason } : {});
    default:
      return api<EventDetail>('POST', `${base}/${change.kind}`, {});
  }
}

/** Every change answers the event again; the cache takes it as it is. */
export function useChangeEvent(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (change: EventChange) => changeEvent(id, change),
    onSuccess: (e) => {
      qc.setQueryData(eventKeys.detail(id), e);
      qc.invalidateQueries({ queryKey: eventKeys.all });
    },
  });
}
