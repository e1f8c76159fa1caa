import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailDetail } from '../../../../../shared/api/admin';
import { api } from '../../../lib/api';
import { adminKeys } from './keys';

const getMail = (id: number) => api<MailDetail>('GET', `/api/admin/mailbox/${id}`);

export const mailQuery = (id: number) => queryOptions({ queryKey: adminKeys.mail(id), queryFn: () => getMail(id) });

export const useMail = (id: number) => useQuery(mailQuery(id));
