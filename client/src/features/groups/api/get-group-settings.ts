import { queryOptions, useQuery } from '@tanstack/react-query';
import type { GroupSettings } from '../../../../../shared/api/groups';
import { api } from '../../../lib/api';
import { groupKeys } from './keys';

const getGroupSettings = (groupId: number) => api<GroupSettings>('GET', `/api/groups/${groupId}/settings`);

export const groupSettingsQuery = (groupId: number) =>
  queryOptions({ queryKey: groupKeys.settings(groupId), queryFn: () => getGroupSettings(groupId) });

export const useGroupSettings = (groupId: number) => useQuery(groupSettingsQuery(groupId));
