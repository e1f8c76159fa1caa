import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';

export interface MailSummary {
  id: number;
  from: string;
  to: string;
  subject: string;
  receivedAt: string;
}
export interface MailDetail extends MailSummary {
  text: string | null;
  hasHtml: boolean;
}
export const adminKeys = {
  mailbox: ['admin', 'mailbox'] as const,
  mail: (id: number) => ['admin', 'mailbox', id] as const,
  outbox: ['admin', 'outbox'] as const,
  groups: ['admin', 'groups'] as const,
  users: ['admin', 'users'] as const,
};

export const useMailbox = () =>
  useQuery({
    queryKey: adminKeys.mailbox,
    queryFn: () => api<MailSummary[]>('GET', '/api/admin/mailbox'),
    refetchInterval: 5000,
  });
export const useMail = (id: number) =>
  useQuery({ queryKey: adminKeys.mail(id), queryFn: () => api<MailDetail>('GET', `/api/admin/mailbox/${id}`) });
export function useClearMailbox() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('DELETE', '/api/admin/mailbox'),
    onSuccess: () => qc.invalidateQueries({ queryKey: adminKeys.mailbox }),
  });
}
