import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ImpactSettings } from './types';
import { api } from '../../../lib/api';

import { impactKeys } from './keys';

export const getImpactSettings = () => api<ImpactSettings>('GET', `/api/admin/impact-settings`);

export const impactSettingsQuery = () =>
  queryOptions({ queryKey: impactKeys.settings(), queryFn: () => getImpactSettings() });

export const useImpactSettings = () => useQuery(impactSettingsQuery());
