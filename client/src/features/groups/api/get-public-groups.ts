import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PublicGroup } from '../../../../../shared/api/groups';
import { api } from '../../../lib/api';
import { groupKeys } from './keys';

const getPublicGroups = () => api<PublicGroup[]>('GET', '/api/public/groups');

export const publicGroupsQuery = () => queryOptions({ queryKey: groupKeys.public(), queryFn: getPublicGroups });

export const usePublicGroups = () => useQuery(publicGroupsQuery());
