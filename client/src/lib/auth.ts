import { queryOptions, useQuery, useSuspenseQuery } from '@tanstack/react-query';
import type { GroupRole } from '../../../shared/constants';
import type { SessionUser } from '../../../shared/schemas/auth';
import { api } from './api';

/** The signed-in person: every feature and the shell read it, so it lives below them all. */
export const userKeys = { me: ['auth', 'me'] as const };

export const meQuery = queryOptions({
  queryKey: userKeys.me,
  queryFn: async (): Promise<SessionUser | null> =>
    (await api<{ user: SessionUser | null }>('GET', '/api/auth/me')).user,
  staleTime: 60_000,
});

export const useUser = () => useQuery(meQuery);
/** For pages behind a role guard: the loader has already made sure someone is signed in. */
export const useSignedInUser = () => useSuspenseQuery(meQuery).data!;

export type Allow = (user: SessionUser) => boolean;

export const hasRole = (user: SessionUser, role: GroupRole) => user.roles.some((r) => r.role === role);
export const groupsWithRole = (user: SessionUser, role: GroupRole) => user.roles.filter((r) => r.role === role);
/** An organiser of this group, or an admin (who passes every group check). */
export const organises = (user: SessionUser | null | undefined, groupId: number) =>
  Boolean(user && (user.admin || user.roles.some((r) => r.groupId === groupId && r.role === 'organiser')));

/** Who may open which pages. The server checks every request anyway; this only spares a useless screen. */
export const allow = {
  signedIn: (() => true) as Allow,
  organiser: ((u) => u.admin || hasRole(u, 'organiser')) as Allow,
  admin: ((u) => u.admin) as Allow,
  volunteer: ((u) => u.admin || u.roles.length > 0) as Allow,
  staff: ((u) => u.admin || hasRole(u, 'host') || hasRole(u, 'organiser')) as Allow,
  fixer: ((u) => hasRole(u, 'fixer')) as Allow,
  fixerOrHost: ((u) => hasRole(u, 'fixer') || hasRole(u, 'host')) as Allow,
  itemReader: ((u) => u.admin || hasRole(u, 'host') || hasRole(u, 'organiser') || hasRole(u, 'fixer')) as Allow,
};
