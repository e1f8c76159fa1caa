import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Invitation } from '../../../../../shared/api/groups';
import { api } from '../../../lib/api';
import { groupKeys } from './keys';

const getInvitation = (token: string) => api<Invitation>('GET', `/api/invites/${token}`);

export const invitationQuery = (token: string) =>
  queryOptions({ queryKey: groupKeys.invitation(token), queryFn: () => getInvitation(token) });

export const useInvitation = (token: string) => useQuery(invitationQuery(token));
