import { readFileSync } from 'node:fs';
import { and, asc, eq, gt, lt, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { events, shifts, slots, users } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';
import { categoryId, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { readCalendar } from '../support/ical';

let app: DemoApp;
let browser: Browser;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

/** A booking made as the form makes it, on the first future slot of a published session that has room. */
async function freshBooking() {
  const [slot] = await app.db.db
    .select({ id: slots.id, startsAt: slots.startsAt, endsAt: slots.endsAt })
    .from(slots)
    .innerJoin(events, eq(events.id, slots.eventId))
    .where(and(eq(events.status, 'published'), gt(slots.startsAt, new Date()), lt(slots.booked, slots.capacity)))
    .orderBy(asc(slots.startsAt), sql`${slots.id}`)
    .limit(1);
  const res = await new Agent(app.server.url).post('/api/bookings', {
    slotId: slot.id,
    visitor: visitor(),
    items: [{ categoryId: await categoryId(app.db.db, 'kettle'), fault: 'It switches off before boiling.' }],
    consent: true,
  });
  expect(res.status).toBe(201);
  return { ...(res.json as { reference: string; manageToken: string }), slot };
}

describe('calendar files on a phone', () => {
  it('the booking page offers "Add to calendar" at 390 px, and the download is text/calendar', async () => {
    const { reference, manageToken, slot } = await freshBooking();
    const context = await browser.newContext({ viewport: PHONE, acceptDownloads: true });
    const page = await context.newPage();
    await page.goto(`${app.server.url}/bookings/${reference}?token=${encodeURIComponent(manageToken)}&new=1`);
    await page.getByText('You are booked').waitFor();
    const link = page.getByRole('link', { name: 'Add to calendar' });
    await link.waitFor();
    const box = (await link.boundingBox())!;
    // WCAG 2.2 SC 2.5.5 (target size, enhanced): 44 by 44 CSS px for a thumb.
    expect(box.height).toBeGreaterThanOrEqual(44);
    expect(box.width).toBeGreaterThanOrEqual(44);
    expect(box.x + box.width).toBeLessThanOrEqual(PHONE.width);
    await link.focus();
    await page.screenshot({ path: shot('booking-add-to-calendar-phone'), fullPage: true });

    const [download] = await Promise.all([page.waitForEvent('download'), link.click()]);
    // Chromium saves a `download` link outside the page's network events, so the page fetches the same href to read
    // the answer's headers.
    const href = (await link.getAttribute('href'))!;
    const answer = await page.evaluate(async (url) => {
      const r = await fetch(url);
      return {
        status: r.status,
        type: r.headers.get('content-type'),
        disposition: r.headers.get('content-disposition'),
      };
    }, href);
    expect(answer).toEqual({
      status: 200,
      type: 'text/calendar; charset=utf-8',
      disposition: `attachment; filename="mendery-${reference}.ics"`,
    });
    expect(download.suggestedFilename()).toBe(`mendery-${reference}.ics`);
    // RFC 5545 §3.8.2.4/§3.8.2.2: the saved file's DTSTART and DTEND are the booked slot's.
    const [entry] = readCalendar(readFileSync((await download.path())!, 'utf8')).events;
    expect(entry.start.toISOString()).toBe(slot.startsAt.toISOString());
    expect(entry.end.toISOString()).toBe(slot.endsAt.toISOString());
    await context.close();
  });

  it('a volunteer makes a calendar link at 390 px, copies it, reads it without a cookie, and stopping it ends it', async () => {
    const url = app.server.url;
    const { context, page } = await signedIn(browser, url, 'fixer', PHONE);
    await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: url });
    await page.goto(`${url}/bench`);
    const make = page.getByRole('button', { name: 'Make a calendar link' });
    await make.scrollIntoViewIfNeeded();
    // WCAG 2.2 SC 2.5.5 (target size, enhanced): 44 CSS px high.
    expect((await make.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    await make.click();
    const field = page.getByLabel('Your calendar link', { exact: true });
    const feedUrl = await field.inputValue();
    expect(feedUrl).toMatch(/\/api\/public\/shift-calendars\/[A-Za-z0-9_-]{43}\.ics$/);
    await page.getByRole('button', { name: 'Copy the link' }).click();
    await page.getByText('Copied.').waitFor();
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(feedUrl);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    await page.screenshot({ path: shot('bench-calendar-link-phone'), fullPage: true });

    // The download link gives the same shifts as a file.
    const href = (await page.getByRole('link', { name: 'Download my shifts' }).getAttribute('href'))!;
    const file = await page.evaluate(async (u) => {
      const r = await fetch(u);
      return { status: r.status, type: r.headers.get('content-type') };
    }, href);
    expect(file).toEqual({ status: 200, type: 'text/calendar; charset=utf-8' });

    // A calendar app has no cookie: node's fetch sends none.
    const feedPath = new URL(feedUrl).pathname;
    const feed = await fetch(`${url}${feedPath}`);
    expect(feed.status).toBe(200);
    expect(feed.headers.get('content-type')).toBe('text/calendar; charset=utf-8');
    const [fixer] = await app.db.db.select().from(users).where(eq(users.email, 'fixer@example.org'));
    const coming = await app.db.db
      .select()
      .from(shifts)
      .where(and(eq(shifts.userId, fixer.id), eq(shifts.coming, true), gt(shifts.endsAt, new Date())));
    const entries = readCalendar(await feed.text()).events;
    // RFC 5545 §3.8.2.4: each upcoming shift the fixer said yes to starts in the feed when it starts in the rota.
    for (const s of coming) expect(entries.map((e) => e.start.getTime())).toContain(s.startsAt.getTime());

    await page.getByRole('button', { name: 'Stop this link' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Stop the link' }).click();
    await page.getByRole('button', { name: 'Make a calendar link' }).waitFor();
    await expect(page.getByLabel('Your calendar link', { exact: true }).count()).resolves.toBe(0);
    expect((await fetch(`${url}${feedPath}`)).status).toBe(404);
    await context.close();
  });
});
