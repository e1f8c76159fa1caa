import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { Profile } from '../../../../../shared/api/skills';
import { api } from '../../../lib/api';
import { skillKeys } from './keys';

export const getProfile = () => api<Profile>('GET', '/api/me/profile');

export const profileQuery = () => queryOptions({ queryKey: skillKeys.profile(), queryFn: getProfile });

/** Read after the route's loader has the profile, so the page renders with it from the start. */
export const useProfile = () => useSuspenseQuery(profileQuery());
