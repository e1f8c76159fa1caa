/** How long a booking's manage link works after its session has ended, unless MANAGE_LINK_DAYS says otherwise. */
export const MANAGE_LINK_DAYS = 30;

const DAY_MS = 86_400_000;

/** The moment a manage link stops working: `days` whole days after the end of its session. */
export const manageLinkEndsAt = (sessionEndsAt: Date, days: number): Date =>
  new Date(sessionEndsAt.getTime() + days * DAY_MS);

/** Whether a manage link for a session that ends at `sessionEndsAt` has run out at `now`. */
export const manageLinkExpired = (sessionEndsAt: Date, days: number, now: Date): boolean =>
  now.getTime() > manageLinkEndsAt(sessionEndsAt, days).getTime();

/** The earliest session end whose manage links still work at `now`. */
export const earliestLiveSessionEnd = (now: Date, days: number): Date => new Date(now.getTime() - days * DAY_MS);
