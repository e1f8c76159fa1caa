/** Every URL of the client, built in one place. */
export const paths = {
  home: () => '/',
  signIn: (next?: string) => (next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'),
  volunteer: () => '/volunteer',
  verifyEmail: () => '/verify-email',
  forgotPassword: () => '/forgot-password',
  resetPassword: () => '/reset-password',
  setup: () => '/setup',
  start: () => '/start',
  bench: () => '/bench',
  desk: () => '/desk',
  groupPeople: (groupId: number) => `/groups/${groupId}/people`,
  admin: () => '/admin',
  adminMailbox: (id?: number) => (id ? `/admin/mailbox/${id}` : '/admin/mailbox'),
  safety: () => '/safety',
};
