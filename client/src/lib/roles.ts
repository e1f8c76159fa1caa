import type { GroupRole } from '../../../shared/constants';
import type { SessionUser } from '../../../shared/schemas/auth';
import { paths } from '../config/paths';

export const groupsWithRole = (user: SessionUser, role: GroupRole) => user.roles.filter((r) => r.role === role);

/** Where a person lands after signing in: the most responsible thing they do. */
export function landingPath(user: SessionUser): string {
  if (user.admin) return paths.admin();
  const organised = groupsWithRole(user, 'organiser')[0];
  if (organised) return paths.groupEvents(organised.groupId);
  if (groupsWithRole(user, 'host').length) return paths.desk();
  if (groupsWithRole(user, 'fixer').length) return paths.bench();
  return paths.home();
}

export const hasRole = (user: SessionUser, role: GroupRole) => user.roles.some((r) => r.role === role);
