import type { GroupRole } from './constants';

/**
 * Who may do what in a repair group, by role: the server's guards and the screens that offer the forms read the same
 * lists, so a form is shown only to someone the server will let use it. Admins pass every check.
 *
 * Reception (`host`) checks people in, prints the intake tags and moves the queue; the bench's work (starting a
 * repair, the electrical safety check, the outcome, repair photos, the salvage stock's parts) is the fixers' and the
 * organisers'.
 */
export const GROUP_ROLES_FOR = {
  /** Open an item's page and read it, its similar past repairs and the salvage stock. */
  readItem: ['organiser', 'host', 'fixer'],
  /** Start a repair, record its safety check, outcome and photos (the item's fixer, or any organiser). */
  benchWork: ['fixer', 'organiser'],
  /** Look up a substitute in the salvage stock, take a part for an item, save parts from an item or edit one. */
  useSalvage: ['fixer', 'organiser'],
} as const satisfies Record<string, readonly GroupRole[]>;

export type GroupAction = keyof typeof GROUP_ROLES_FOR;

interface RoleHolder {
  admin: boolean;
  roles: readonly { groupId: number; role: GroupRole }[];
}

/** Whether the person holds one of `roles` in the group (admins always). */
export function holdsGroupRole(user: RoleHolder | null | undefined, groupId: number, roles: readonly GroupRole[]) {
  if (!user) return false;
  if (user.admin) return true;
  return user.roles.some((r) => r.groupId === groupId && roles.includes(r.role));
}

/** Whether the person may do `action` in the group. */
export const mayInGroup = (user: RoleHolder | null | undefined, groupId: number, action: GroupAction) =>
  holdsGroupRole(user, groupId, GROUP_ROLES_FOR[action]);
