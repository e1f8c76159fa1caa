import type { SessionUser } from '../../../shared/schemas/auth';
import { paths } from '../config/paths';
import { groupsWithRole } from './auth';

/** Where a person lands after signing in: the most responsible thing they do. */
export function landingPath(user: SessionUser): string {
  if (user.admin) return paths.admin();
  const organised = groupsWithRole(user, 'organiser')[0];
  if (organised) return paths.groupEvents(organised.groupId);
  if (groupsWithRole(user, 'host').length) return paths.desk();
  if (groupsWithRole(user, 'fixer').length) return paths.bench();
  return paths.home();
}
