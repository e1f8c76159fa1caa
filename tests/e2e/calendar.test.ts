import { readFileSync } from 'node:fs';
import { and, asc, eq, gt, lt, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { events, slots } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot } from '../support/browser';
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
});
