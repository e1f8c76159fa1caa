import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { PrivacyNotice } from '../../../../../shared/privacy/notice';
import { api } from '../../../lib/api';
import { privacyKeys } from './keys';

export const privacyNoticeQuery = (groupId: number) =>
  queryOptions({
    queryKey: privacyKeys.notice(groupId),
    queryFn: () => api<PrivacyNotice>('GET', `/api/public/groups/${groupId}/privacy`),
  });

export const usePrivacyNotice = (groupId: number) => useSuspenseQuery(privacyNoticeQuery(groupId));
