import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OutboxView } from '../../../../../shared/api/admin';
import { api } from '../../../lib/api';
import { adminKeys } from './keys';

const getOutbox = () => api<OutboxView>('GET', '/api/admin/outbox');

export const outboxQuery = () =>
  queryOptions({ queryKey: adminKeys.outbox(), queryFn: getOutbox, refetchInterval: 5000 });

export const useOutbox = () => useQuery(outboxQuery());
