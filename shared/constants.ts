/** Roles held within one repair group. A visitor needs no role (and no account); admin is platform-wide. */
export const GROUP_ROLES = ['organiser', 'host', 'fixer'] as const;
export type GroupRole = (typeof GROUP_ROLES)[number];

export const MEMBERSHIP_STATUSES = ['active', 'pending'] as const;
export type MembershipStatus = (typeof MEMBERSHIP_STATUSES)[number];

export const ROLE_LABELS: Record<GroupRole, string> = {
  organiser: 'Organiser',
  host: 'Reception',
  fixer: 'Fixer',
};

export const DEMO_PASSWORD = 'mendery-demo';
