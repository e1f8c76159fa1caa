import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { formatTime } from '../../shared/format';
import { repairGroups, slots, slotSkillCounts } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';
import { makeEvent, makeGroup } from '../support/factories';

// The booking page and the session page show what the shared rule (shared/booking/bookability.ts) says for the
// items chosen, the same answer the server gives on submit.
let app: DemoApp;
let browser: Browser;
let eventId: number;
let tz: string;
let times: { id: number; startsAt: Date; endsAt: Date }[];

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const db = app.db.db;
  const groupId = await makeGroup(db, `Bookability group ${Date.now()}`);
  [{ timeZone: tz }] = await db.select().from(repairGroups).where(eq(repairGroups.id, groupId));
  // Today: two times already over, one under way, three to come; at most one textile item per time.
  const half = 30 * 60_000;
  const startsAt = new Date(Math.floor(Date.now() / half) * half - 2 * half);
  const made = await makeEvent(db, groupId, { capacity: 4, slotCount: 6, startsAt, skillLimits: { textiles: 1 } });
  eventId = made.eventId;
  times = await db.select().from(slots).where(eq(slots.eventId, eventId)).orderBy(slots.startsAt);
  // The fourth time already has its one textile item booked, with three places still free.
  await db.update(slots).set({ booked: 1 }).where(eq(slots.id, times[3].id));
  await db.insert(slotSkillCounts).values({ slotId: times[3].id, skill: 'textiles', booked: 1 });
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

describe('time tiles show what is true for these items', () => {
  it('does not offer today’s past times on the session page nor the booking page', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await page.goto(`${app.server.url}/events/${eventId}`);
    await page.getByRole('heading', { name: 'Times and free places' }).waitFor();
    await page.getByText(formatTime(times[2].startsAt, tz), { exact: true }).first().waitFor();
    for (const past of times.slice(0, 2))
      expect(await page.getByText(formatTime(past.startsAt, tz), { exact: true }).count()).toBe(0);

    await page.goto(`${app.server.url}/events/${eventId}/book`);
    await page.getByRole('heading', { name: 'Book a repair slot' }).waitFor();
    await page.locator('label', { hasText: formatTime(times[2].startsAt, tz) }).waitFor();
    for (const past of times.slice(0, 2))
      expect(await page.locator('label', { hasText: formatTime(past.startsAt, tz) }).count()).toBe(0);
    await page.close();
  });

  it('a clothing item cannot pick a time whose textile limit is reached, the tile says why, and a time that fits books', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await page.goto(`${app.server.url}/events/${eventId}/book`);
    await page.getByRole('heading', { name: 'Book a repair slot' }).waitFor();
    const fullTile = page.locator('label', { hasText: formatTime(times[3].startsAt, tz) });
    // Before the kind is known, the time has 3 places free.
    await fullTile.getByText('3 free').waitFor();
    await page.getByLabel('What is it?').selectOption({ label: 'Clothing' });
    await fullTile.getByText('Textile repairs are full at this time').waitFor();
    expect(await fullTile.locator('input[type=radio]').isDisabled()).toBe(true);
    await page.screenshot({ path: shot('booking-textile-limit'), fullPage: true });

    const fits = page.locator('label', { hasText: formatTime(times[4].startsAt, tz) });
    await fits.getByText('4 free').waitFor();
    await fits.click();
    await page.getByLabel('Your name').fill('Wenna Trelask');
    await page.getByLabel('E-mail').fill('wenna@example.org');
    await page.getByLabel('What is wrong with it?').fill('The zip of the coat has come away from the seam.');
    await page.getByLabel(/I accept the house rules/).check();
    await page.getByRole('button', { name: 'Book my slot' }).click();
    await page.getByText('You are booked').waitFor({ timeout: 15_000 });
    const [after] = await app.db.db.select().from(slotSkillCounts).where(eq(slotSkillCounts.slotId, times[4].id));
    expect(after.booked).toBe(1);
    await page.close();
  });
});
