import { tz } from '@date-fns/tz';
import { format } from 'date-fns';

/** Where a session sits for its organisers: on today's date or running, still to come, or over. */
export type SessionWhen = 'today' | 'upcoming' | 'past';

/** The calendar date (yyyy-MM-dd) of an instant on the wall clocks of a time zone. */
export const localDate = (d: Date | string, timeZone: string) =>
  format(new Date(d), 'yyyy-MM-dd', { in: tz(timeZone) });

/**
 * Today is the group's today, read in the group's time zone: a session that starts on that date is "today" all day
 * long (also once it has ended, so the team finds it until midnight), and so is one that runs past midnight while
 * it runs. A later date is upcoming; anything else is past.
 */
export function sessionWhen(
  s: { startsAt: Date | string; endsAt: Date | string },
  now: Date,
  timeZone: string,
): SessionWhen {
  const today = localDate(now, timeZone);
  const day = localDate(s.startsAt, timeZone);
  if (day === today) return 'today';
  if (day > today) return 'upcoming';
  return new Date(s.endsAt).getTime() > now.getTime() ? 'today' : 'past';
}

const time = (d: Date | string) => new Date(d).getTime();

/**
 * An organiser's list split in two: today's and upcoming sessions soonest first (today's lead, as they are the
 * soonest), and past ones most recent first. Each session is read in its own group's time zone.
 */
export function splitSessions<S extends { startsAt: Date | string; endsAt: Date | string; timeZone: string }>(
  sessions: readonly S[],
  now: Date,
) {
  const coming: (S & { when: 'today' | 'upcoming' })[] = [];
  const past: (S & { when: 'past' })[] = [];
  for (const s of sessions) {
    const when = sessionWhen(s, now, s.timeZone);
    if (when === 'past') past.push({ ...s, when });
    else coming.push({ ...s, when });
  }
  coming.sort((a, b) => time(a.startsAt) - time(b.startsAt));
  past.sort((a, b) => time(b.startsAt) - time(a.startsAt));
  return { coming, past };
}
