import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Profile } from '../../../../../shared/api/skills';
import { api } from '../../../lib/api';
import { skillKeys } from './keys';

export const getProfile = () => api<Profile>('GET', '/api/me/profile');

export const profileQuery = () => queryOptions({ queryKey: skillKeys.profile(), queryFn: getProfile });

export const useProfile = () => useQuery(profileQuery());
