import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventSummary } from '../../../../../shared/api/events';
import { api } from '../../../lib/api';
import { eventKeys } from './keys';

/** Every session of a group, drafts included, for its team. */
const getGroupEvents = (groupId: number) => api<EventSummary[]>('GET', `/api/groups/${groupId}/events`);

export const groupEventsQuery = (groupId: number) =>
  queryOptions({ queryKey: eventKeys.group(groupId), queryFn: () => getGroupEvents(groupId) });

export const useGroupEvents = (groupId: number) => useQuery(groupEventsQuery(groupId));
