import { queryOptions } from '@tanstack/react-query';
import type { Venue } from '../../../../../shared/api/groups';
import { api } from '../../../lib/api';
import { groupKeys } from './keys';

const getVenues = (groupId: number) => api<Venue[]>('GET', `/api/venues?groupId=${groupId}`);

export const venuesQuery = (groupId: number) =>
  queryOptions({ queryKey: groupKeys.venues(groupId), queryFn: () => getVenues(groupId) });
