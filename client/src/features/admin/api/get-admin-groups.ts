import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AdminGroup } from '../../../../../shared/api/admin';
import { api } from '../../../lib/api';
import { adminKeys } from './keys';

const getAdminGroups = () => api<AdminGroup[]>('GET', '/api/admin/groups');

export const adminGroupsQuery = () => queryOptions({ queryKey: adminKeys.groups(), queryFn: getAdminGroups });

export const useAdminGroups = () => useQuery(adminGroupsQuery());
