import { useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { adminKeys } from './mailbox';

export interface OutboxView {
  totals: Partial<Record<'pending' | 'sent' | 'failed', number>>;
  recent: {
    id: number;
    to: string;
    subject: string;
    status: string;
    attempts: number;
    lastError: string | null;
    createdAt: string;
    sentAt: string | null;
    nextAttemptAt: string;
  }[];
}
export const useOutbox = () =>
  useQuery({
    queryKey: adminKeys.outbox,
    queryFn: () => api<OutboxView>('GET', '/api/admin/outbox'),
    refetchInterval: 5000,
  });
export const useAdminGroups = () =>
  useQuery({
    queryKey: adminKeys.groups,
    queryFn: () => api<{ id: number; name: string; town: string; members: number }[]>('GET', '/api/admin/groups'),
  });
export const useAdminUsers = () =>
  useQuery({
    queryKey: adminKeys.users,
    queryFn: () =>
      api<{ id: number; name: string; email: string; admin: boolean; verified: boolean }[]>('GET', '/api/admin/users'),
  });
