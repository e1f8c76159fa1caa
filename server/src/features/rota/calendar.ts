import { randomBytes } from 'node:crypto';
import type { CalendarLink, CalendarLinkStatus } from '../../../../shared/api/rota';
import { FEED_PAST_DAYS, shiftEntry, shiftRole } from '../../../../shared/calendar';
import type { GroupRole } from '../../../../shared/constants';
import type { AppContext } from '../../context';
import { sha256 } from '../../auth/tokens';
import { calendarText } from '../../core/calendar';
import { notFound } from '../../http/errors';
import * as q from './queries';
import type { Language } from '../../../../shared/i18n/languages';
import { asLanguage } from '../../../../shared/i18n/languages';
import { translate } from '../../i18n';

/** 32 random bytes (256 bits) in base64url: the only form a feed secret takes. */
const SECRET = /^[A-Za-z0-9_-]{43}$/;
const feedUrl = (ctx: AppContext, secret: string) => `${ctx.env.publicUrl}/api/public/shift-calendars/${secret}.ics`;

/** A new secret feed link for the person; the old one, if any, stops answering at once. Shown once: only its hash stays. */
export async function makeCalendarLink(ctx: AppContext, userId: number): Promise<CalendarLink> {
  const secret = randomBytes(32).toString('base64url');
  await q.setCalendarFeedHash(ctx.database.db, userId, sha256(secret));
  return { live: true, url: feedUrl(ctx, secret) };
}

export async function stopCalendarLink(ctx: AppContext, userId: number) {
  await q.setCalendarFeedHash(ctx.database.db, userId, null);
}

export async function calendarLinkStatus(ctx: AppContext, userId: number): Promise<CalendarLinkStatus> {
  return { live: Boolean(await q.calendarFeedHashOf(ctx.database.db, userId)) };
}

/** The person a feed secret belongs to; a malformed, stopped or unknown secret is "not found", all alike. */
export async function feedOwner(ctx: AppContext, secret: string) {
  if (!SECRET.test(secret)) throw notFound('That calendar link');
  const userId = await q.userOfCalendarFeedHash(ctx.database.db, sha256(secret));
  if (!userId) throw notFound('That calendar link');
  return userId;
}

/**
 * The shifts a person said they will come to, in every group they are active in: the last FEED_PAST_DAYS days and
 * everything ahead, of sessions that are published or closed (a cancelled session drops out of the feed).
 */
export async function shiftsCalendar(ctx: AppContext, userId: number, fallback: Language) {
  const { db } = ctx.database;
  const now = new Date();
  const roles = new Map<number, GroupRole[]>();
  for (const m of await q.activeRolesOf(db, userId)) roles.set(m.groupId, [...(roles.get(m.groupId) ?? []), m.role]);
  const since = new Date(now.getTime() - FEED_PAST_DAYS * 86_400_000);
  // A calendar app asks for the feed with no person's language: the one the person chose, else the request's.
  const lang = asLanguage((await q.languageOfUser(db, userId)) ?? fallback);
  const rows = (await q.comingShiftsOf(db, userId, since)).filter((r) => roles.has(r.groupId));
  const entries = rows.map((r) =>
    shiftEntry(
      {
        shiftId: r.shiftId,
        eventId: r.eventId,
        eventTitle: r.eventTitle,
        groupName: r.groupName,
        role: shiftRole(roles.get(r.groupId)!),
        startsAt: r.startsAt,
        endsAt: r.endsAt,
        venue: { name: r.venueName, address: r.venueAddress, town: r.venueTown },
        bench: r.bench,
      },
      ctx.env.publicUrl,
      now,
      (key, values) => translate(lang, `mail.ics.shift.${key}`, values),
    ),
  );
  return calendarText(translate(lang, 'mail.ics.shift.name'), entries, 6);
}
