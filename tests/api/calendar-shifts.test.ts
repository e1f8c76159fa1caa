import { TZDate } from '@date-fns/tz';
import { eq, like } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { events, memberships, rateLimits, shifts, users, venues } from '../../server/src/db/schema/index';
import { sha256 } from '../../server/src/auth/tokens';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeEvent, makeGroup, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { readCalendar } from '../support/ical';
import { startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
let groupA: number;
let groupB: number;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  groupA = await makeGroup(db.db);
  groupB = await makeGroup(db.db);
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const DAY = 86_400_000;
/** A session start `days` ago, on the hour, as sessions are (iCalendar times have whole seconds, RFC 5545 §3.3.12). */
const daysAgo = (days: number) => new Date(Math.floor((Date.now() - days * DAY) / 3_600_000) * 3_600_000);
const nextYear = new Date().getUTCFullYear() + 1;
/** The path part of a feed URL, so the test reaches this server whatever PUBLIC_URL the links carry. */
const pathOf = (url: string) => new URL(url).pathname;
const anonymous = () => new Agent(server.url);

async function volunteer(roles: [number, 'fixer' | 'host' | 'organiser'][]) {
  const u = await makeUser(db.db, { roles });
  const a = new Agent(server.url);
  expect((await a.login(u.email, u.password)).status).toBe(200);
  return { ...u, agent: a };
}
async function say(a: Agent, eventId: number, answer: { coming: boolean; startsAt?: Date; endsAt?: Date }) {
  const res = await a.send('PUT', `/api/events/${eventId}/shifts/me`, answer);
  expect(res.status).toBe(200);
}
async function makeLink(a: Agent) {
  const res = await a.post('/api/me/calendar-link');
  expect(res.status).toBe(201);
  return res.json.url as string;
}
const shiftOf = async (eventId: number, userId: number) =>
  (await db.db.select().from(shifts).where(eq(shifts.eventId, eventId))).find((s) => s.userId === userId)!;

describe("a volunteer's shift feed", () => {
  it('holds every coming shift of all their groups, recent past and ahead, as ical.js reads it without a cookie', async () => {
    const v = await volunteer([
      [groupA, 'fixer'],
      [groupA, 'organiser'],
      [groupB, 'host'],
    ]);
    const soon = await makeEvent(db.db, groupA, { slotCount: 8 });
    const other = await makeEvent(db.db, groupB);
    const lastWeek = await makeEvent(db.db, groupA, { startsAt: daysAgo(7) });
    const longAgo = await makeEvent(db.db, groupA, { startsAt: daysAgo(60) });
    const notComing = await makeEvent(db.db, groupB);
    const cancelled = await makeEvent(db.db, groupA);
    const [soonEvent] = await db.db.select().from(events).where(eq(events.id, soon.eventId));
    // Part of the session only: from an hour in to the end.
    await say(v.agent, soon.eventId, { coming: true, startsAt: new Date(soonEvent.startsAt.getTime() + 3_600_000) });
    await say(v.agent, other.eventId, { coming: true });
    await say(v.agent, lastWeek.eventId, { coming: true });
    await say(v.agent, longAgo.eventId, { coming: true });
    await say(v.agent, notComing.eventId, { coming: false });
    await say(v.agent, cancelled.eventId, { coming: true });
    await db.db.update(events).set({ status: 'cancelled' }).where(eq(events.id, cancelled.eventId));
    // Someone else's shift at the same session stays out of this feed.
    const other1 = await volunteer([[groupA, 'fixer']]);
    await say(other1.agent, soon.eventId, { coming: true });

    const url = await makeLink(v.agent);
    const res = await anonymous().get(pathOf(url));
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('text/calendar; charset=utf-8');
    expect(res.headers.get('set-cookie')).toBeNull();
    const cal = readCalendar(res.text);
    // RFC 5545 §3.6.1: one VEVENT per shift; the feed keeps FEED_PAST_DAYS (30) days back, so 60 days ago is out.
    const byEvent = new Map(cal.events.map((e) => [Number(e.url.split('/').pop()), e]));
    expect([...byEvent.keys()].sort()).toEqual([soon.eventId, other.eventId, lastWeek.eventId].sort());

    for (const [eventId, venueId, summary] of [
      [soon.eventId, soon.venueId, 'Fixing at'],
      [other.eventId, other.venueId, 'Reception at'],
      [lastWeek.eventId, lastWeek.venueId, 'Fixing at'],
    ] as const) {
      const e = byEvent.get(eventId)!;
      const shift = await shiftOf(eventId, v.id);
      const [venue] = await db.db.select().from(venues).where(eq(venues.id, venueId));
      const [event] = await db.db.select().from(events).where(eq(events.id, eventId));
      // RFC 5545 §3.8.2.4 DTSTART, §3.8.2.2 DTEND: the shift's own hours, in UTC (§3.3.5 form 2).
      expect(e.start.toISOString()).toBe(shift.startsAt.toISOString());
      expect(e.end.toISOString()).toBe(shift.endsAt.toISOString());
      expect(e.startIsUtc).toBe(true);
      // RFC 5545 §3.8.1.7 LOCATION, §3.8.4.6 URL, §3.8.1.12 SUMMARY.
      expect(e.location).toBe(`${venue.name}, ${venue.address}, ${venue.town}`);
      expect(new URL(e.url).pathname).toBe(`/events/${eventId}`);
      expect(e.summary).toBe(`${summary} ${event.title}`);
      // RFC 5545 §3.8.4.7 UID, §3.8.7.2 DTSTAMP: required in every VEVENT.
      expect(e.uid).toMatch(new RegExp(`^shift-${shift.id}@`));
      expect(e.stamp).toBeInstanceOf(Date);
    }
    expect(byEvent.get(soon.eventId)!.start.getTime()).toBe(soonEvent.startsAt.getTime() + 3_600_000);
  });

  it('keeps each UID when the hours change, so the calendar moves the entry', async () => {
    const v = await volunteer([[groupA, 'fixer']]);
    const ev = await makeEvent(db.db, groupA, { slotCount: 6 });
    await say(v.agent, ev.eventId, { coming: true });
    const path = pathOf(await makeLink(v.agent));
    const [before] = readCalendar((await anonymous().get(path)).text).events;
    const [event] = await db.db.select().from(events).where(eq(events.id, ev.eventId));
    await say(v.agent, ev.eventId, { coming: true, endsAt: new Date(event.startsAt.getTime() + 3_600_000) });
    const [after] = readCalendar((await anonymous().get(path)).text).events;
    expect(after.uid).toBe(before.uid);
    expect(after.end.toISOString()).toBe(new Date(event.startsAt.getTime() + 3_600_000).toISOString());
  });

  it('is right in British summer and winter time: a 10:00 London shift is 09:00Z in July and 10:00Z in January', async () => {
    // UK civil time: BST (UTC+1) from the last Sunday of March to the last Sunday of October, GMT (UTC+0) otherwise
    // (Summer Time Act 1972; Summer-time directive 2000/84/EC).
    const v = await volunteer([[groupA, 'fixer']]);
    const july = await makeEvent(db.db, groupA, {
      startsAt: new Date(new TZDate(nextYear, 6, 15, 10, 0, 0, 'Europe/London').getTime()),
    });
    const january = await makeEvent(db.db, groupA, {
      startsAt: new Date(new TZDate(nextYear, 0, 15, 10, 0, 0, 'Europe/London').getTime()),
    });
    await say(v.agent, july.eventId, { coming: true });
    await say(v.agent, january.eventId, { coming: true });
    const cal = readCalendar((await anonymous().get(pathOf(await makeLink(v.agent)))).text);
    const starts = cal.events.map((e) => e.start.toISOString()).sort();
    expect(starts).toEqual([`${nextYear}-01-15T10:00:00.000Z`, `${nextYear}-07-15T09:00:00.000Z`]);
    const london = new Intl.DateTimeFormat('en-GB', { timeZone: 'Europe/London', timeStyle: 'short' });
    expect(cal.events.map((e) => london.format(e.start))).toEqual(['10:00', '10:00']);
  });
});

describe('the secret link', () => {
  it('is 256 random bits, stored only as its SHA-256, and different for every person and every time', async () => {
    const seen = new Set<string>();
    for (let i = 0; i < 5; i++) {
      const v = await volunteer([[groupA, 'fixer']]);
      const secret = pathOf(await makeLink(v.agent))
        .split('/')
        .pop()!
        .replace(/\.ics$/, '');
      // 43 base64url characters carry 258 bits, of which randomBytes(32) fills 256 (RFC 4648 §5).
      expect(secret).toMatch(/^[A-Za-z0-9_-]{43}$/);
      expect(Buffer.from(secret, 'base64url')).toHaveLength(32);
      const [row] = await db.db.select().from(users).where(eq(users.id, v.id));
      expect(row.calendarFeedHash).toBe(sha256(secret));
      expect(JSON.stringify(row)).not.toContain(secret);
      seen.add(secret);
    }
    expect(seen.size).toBe(5);
  });

  it('stops answering (404) after "Stop this link" and after a new link is made; the new one answers', async () => {
    const v = await volunteer([[groupA, 'fixer']]);
    const first = pathOf(await makeLink(v.agent));
    expect((await anonymous().get(first)).status).toBe(200);
    expect((await v.agent.get('/api/me/calendar-link')).json).toEqual({ live: true });

    const second = pathOf(await makeLink(v.agent));
    expect(second).not.toBe(first);
    const old = await anonymous().get(first);
    expect(old.status).toBe(404);
    expect(old.json.error.code).toBe('not-found');
    expect((await anonymous().get(second)).status).toBe(200);

    expect((await v.agent.delete('/api/me/calendar-link')).status).toBe(204);
    expect((await anonymous().get(second)).status).toBe(404);
    expect((await v.agent.get('/api/me/calendar-link')).json).toEqual({ live: false });
    const [row] = await db.db.select().from(users).where(eq(users.id, v.id));
    expect(row.calendarFeedHash).toBeNull();
  });

  it('answers 404 for a malformed, unknown or empty secret, and 400 for a broken escape', async () => {
    for (const path of [
      '/api/public/shift-calendars/short.ics',
      `/api/public/shift-calendars/${'A'.repeat(43)}.ics`,
      `/api/public/shift-calendars/${'A'.repeat(43)}`,
      `/api/public/shift-calendars/${'A'.repeat(500)}.ics`,
      '/api/public/shift-calendars/.ics',
    ]) {
      const res = await anonymous().get(path);
      expect(res.status, path).toBe(404);
    }
    expect((await anonymous().get('/api/public/shift-calendars/%E0%A4%A.ics')).status).toBe(400);
  });

  it('needs a signed-in person to make, stop or see a link, or to download the file', async () => {
    const a = anonymous();
    expect((await a.post('/api/me/calendar-link')).status).toBe(401);
    expect((await a.delete('/api/me/calendar-link')).status).toBe(401);
    expect((await a.get('/api/me/calendar-link')).status).toBe(401);
    expect((await a.get('/api/me/shifts/calendar')).status).toBe(401);
  });

  it('gives a signed-in volunteer the same shifts as a file to download', async () => {
    const v = await volunteer([[groupA, 'fixer']]);
    const ev = await makeEvent(db.db, groupA);
    await say(v.agent, ev.eventId, { coming: true });
    const res = await v.agent.get('/api/me/shifts/calendar');
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('text/calendar; charset=utf-8');
    expect(res.headers.get('content-disposition')).toBe('attachment; filename="mendery-shifts.ics"');
    const [e] = readCalendar(res.text).events;
    const shift = await shiftOf(ev.eventId, v.id);
    expect(e.start.toISOString()).toBe(shift.startsAt.toISOString());
    expect(e.end.toISOString()).toBe(shift.endsAt.toISOString());
  });

  it('words the feed in the language the person chose, whoever asks for it', async () => {
    const v = await volunteer([[groupA, 'host']]);
    await db.db.update(users).set({ language: 'de' }).where(eq(users.id, v.id));
    const ev = await makeEvent(db.db, groupA);
    await say(v.agent, ev.eventId, { coming: true });
    const path = pathOf(await makeLink(v.agent));
    // A calendar app asks in English; the person reads German.
    const text = (await new Agent(server.url, { 'accept-language': 'en-GB' }).get(path)).text;
    const [e] = readCalendar(text).events;
    expect(e.summary).toMatch(/^Empfang beim Termin /);
    expect(e.description).toMatch(/Der Termin in Mendery: /);
    expect(text).toMatch(/X-WR-CALNAME:Meine Einsätze bei Mendery/);
    // Someone who chose nothing gets the request's language.
    await db.db.update(users).set({ language: null }).where(eq(users.id, v.id));
    const fr = readCalendar((await new Agent(server.url, { 'accept-language': 'fr' }).get(path)).text).events[0];
    expect(fr.summary).toMatch(/^Accueil à l’atelier /);
  });

  it('drops the shifts of a group the person has left', async () => {
    const v = await volunteer([[groupB, 'fixer']]);
    const ev = await makeEvent(db.db, groupB);
    await say(v.agent, ev.eventId, { coming: true });
    const path = pathOf(await makeLink(v.agent));
    expect(readCalendar((await anonymous().get(path)).text).events).toHaveLength(1);
    await db.db.delete(memberships).where(eq(memberships.userId, v.id));
    expect(readCalendar((await anonymous().get(path)).text).events).toHaveLength(0);
  });

  it('is rate-limited per source address like a public read: 429 past FEED_RATE_MAX', async () => {
    // The counters live in the database this file's server shares: start from none.
    await db.db.delete(rateLimits).where(like(rateLimits.key, 'shift-feed:%'));
    const limited = await startTestServer(db.url, { FEED_RATE_MAX: '3' });
    try {
      const a = new Agent(limited.url);
      const path = `/api/public/shift-calendars/${'B'.repeat(43)}.ics`;
      for (let i = 0; i < 3; i++) expect((await a.get(path)).status).toBe(404);
      const res = await a.get(path);
      expect(res.status).toBe(429);
      expect(res.json.error.code).toBe('rate-limited');
    } finally {
      await limited.stop();
    }
  });
});
