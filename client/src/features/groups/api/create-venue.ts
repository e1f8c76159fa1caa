import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Venue } from '../../../../../shared/api/groups';
import { api } from '../../../lib/api';
import { groupKeys } from './keys';

const createVenue = (v: Omit<Venue, 'id'>) => api<Venue>('POST', '/api/venues', v);

export function useCreateVenue(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createVenue,
    onSuccess: () => qc.invalidateQueries({ queryKey: groupKeys.venues(groupId) }),
  });
}
