import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SessionFigures } from '../../../../../shared/api/impact';
import { api } from '../../../lib/api';
import { impactKeys } from './keys';

/** Each past session's outcomes and kilograms, for organisers; other roles do not ask. */
const getSessionFigures = (groupId: number) => api<SessionFigures[]>('GET', `/api/groups/${groupId}/session-figures`);

export const sessionFiguresQuery = (groupId: number) =>
  queryOptions({ queryKey: impactKeys.sessionFigures(groupId), queryFn: () => getSessionFigures(groupId) });

export const useSessionFigures = (groupId: number, enabled: boolean) =>
  useQuery({ ...sessionFiguresQuery(groupId), enabled });
