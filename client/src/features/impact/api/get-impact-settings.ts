import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { ImpactSettings } from './types';
import { api } from '../../../lib/api';

import { impactKeys } from './keys';

export const getImpactSettings = () => api<ImpactSettings>('GET', `/api/admin/impact-settings`);

export const impactSettingsQuery = () =>
  queryOptions({ queryKey: impactKeys.settings(), queryFn: () => getImpactSettings() });

/** Read after the route's loader has the setting, so the page renders with it from the start. */
export const useImpactSettings = () => useSuspenseQuery(impactSettingsQuery());
