import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EventDetail } from '../../../../../shared/api/events';
import { api } from '../../../lib/api';
import { eventKeys } from './keys';

const createEvent = (input: Record<string, unknown>) => api<EventDetail>('POST', '/api/events', input);

export function useCreateEvent() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createEvent,
    onSuccess: (e) => {
      qc.setQueryData(eventKeys.detail(e.id), e);
      qc.invalidateQueries({ queryKey: eventKeys.all });
    },
  });
}
