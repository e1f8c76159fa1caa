import { useMutation } from '@tanstack/react-query';
import type { GroupRole } from '../../../../../shared/constants';
import { api } from '../../../lib/api';

const inviteMember = (groupId: number, v: { email: string; role: GroupRole }) =>
  api('POST', `/api/groups/${groupId}/invites`, v);

export const useInviteMember = (groupId: number) =>
  useMutation({ mutationFn: (v: { email: string; role: GroupRole }) => inviteMember(groupId, v) });
