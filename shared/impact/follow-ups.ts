/**
 * An item recorded as needing a part is followed up: the visitor gets the part's details and a priority link to
 * re-book; the organisers see where each one stands. Reminder after six weeks of no news.
 */
export const FOLLOW_UP_STATUSES = [
  'open',
  'part-ordered',
  'rebooked',
  'came-back',
  'fixed-at-return',
  'gave-up',
] as const;
export type FollowUpStatus = (typeof FOLLOW_UP_STATUSES)[number];
export const FOLLOW_UP_LABELS: Record<FollowUpStatus, string> = {
  open: 'Waiting for news',
  'part-ordered': 'Part ordered',
  rebooked: 'Re-booked',
  'came-back': 'Came back',
  'fixed-at-return': 'Fixed at return',
  'gave-up': 'Gave up',
};
/** Statuses an organiser may set by hand; the others follow from bookings and outcomes. */
export const MANUAL_FOLLOW_UP_STATUSES = [
  'open',
  'part-ordered',
  'gave-up',
] as const satisfies readonly FollowUpStatus[];
export const FOLLOW_UP_REMINDER_DAYS = 42;

/** Whether a follow-up is due a reminder: still waiting six weeks after the part was asked for, not yet reminded. */
export function reminderDue(
  f: { status: FollowUpStatus; createdAt: Date; remindedAt: Date | null },
  now: Date,
): boolean {
  return (
    (f.status === 'open' || f.status === 'part-ordered') &&
    f.remindedAt === null &&
    now.getTime() - f.createdAt.getTime() >= FOLLOW_UP_REMINDER_DAYS * 86400_000
  );
}
