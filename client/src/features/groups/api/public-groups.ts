import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';

export interface PublicGroup {
  id: number;
  name: string;
  slug: string;
  town: string;
  description: string;
}
export const groupKeys = {
  public: ['groups', 'public'] as const,
  members: (groupId: number) => ['groups', groupId, 'members'] as const,
};
export const publicGroupsQuery = queryOptions({
  queryKey: groupKeys.public,
  queryFn: () => api<PublicGroup[]>('GET', '/api/public/groups'),
});
export const usePublicGroups = () => useQuery(publicGroupsQuery);
