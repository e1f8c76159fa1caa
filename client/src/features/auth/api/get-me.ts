import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SessionUser } from '../../../../../shared/schemas/auth';
import { api, ApiError } from '../../../lib/api';

export const authKeys = { me: ['auth', 'me'] as const, config: ['public', 'config'] as const };

export const meQuery = queryOptions({
  queryKey: authKeys.me,
  queryFn: async (): Promise<SessionUser | null> => {
    try {
      return (await api<{ user: SessionUser }>('GET', '/api/auth/me')).user;
    } catch (err) {
      if (err instanceof ApiError && err.status === 401) return null;
      throw err;
    }
  },
  staleTime: 60_000,
});

export const useUser = () => useQuery(meQuery);
