/** Every query key of the admin feature; invalidate by `adminKeys.all`. */
export const adminKeys = {
  all: ['admin'] as const,
  mailbox: () => [...adminKeys.all, 'mailbox'] as const,
  mail: (id: number) => [...adminKeys.mailbox(), id] as const,
  outbox: () => [...adminKeys.all, 'outbox'] as const,
  groups: () => [...adminKeys.all, 'groups'] as const,
  users: () => [...adminKeys.all, 'users'] as const,
};
