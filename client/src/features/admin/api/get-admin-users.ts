import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AdminUser } from '../../../../../shared/api/admin';
import { api } from '../../../lib/api';
import { adminKeys } from './keys';

const getAdminUsers = () => api<AdminUser[]>('GET', '/api/admin/users');

export const adminUsersQuery = () => queryOptions({ queryKey: adminKeys.users(), queryFn: getAdminUsers });

export const useAdminUsers = () => useQuery(adminUsersQuery());
