import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailSummary } from '../../../../../shared/api/admin';
import { api } from '../../../lib/api';
import { adminKeys } from './keys';

const getMailbox = () => api<MailSummary[]>('GET', '/api/admin/mailbox');

/** The local mailbox is watched while open: a mail sent from another tab shows within seconds. */
export const mailboxQuery = () =>
  queryOptions({ queryKey: adminKeys.mailbox(), queryFn: getMailbox, refetchInterval: 5000 });

export const useMailbox = () => useQuery(mailboxQuery());
