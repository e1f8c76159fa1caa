import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { and, eq, inArray } from 'drizzle-orm';
import { bookingItems, bookings, categories, events, repairGroups } from '../../server/src/db/schema/index';
import { TODAY_TITLE } from '../../server/src/seed/demo-today';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let browser: Browser;
let groupId: number;
let eventId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  [{ id: groupId }] = await app.db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
  [{ id: eventId }] = await app.db.db.select().from(events).where(eq(events.title, TODAY_TITLE));
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

describe('the organiser’s section links on a phone', () => {
  for (const [name, url, nav] of [
    ['group', () => `/groups/${groupId}/settings`, 'Group'],
    ['session', () => `/events/${eventId}/manage`, 'Session'],
  ] as const)
    it(`shows every ${name} section at 390 px without scrolling sideways, each a 44 px target`, async () => {
      const { context, page } = await signedIn(browser, app.server.url, 'organiser', PHONE);
      await page.goto(app.server.url + url());
      const links = page.getByRole('navigation', { name: nav }).getByRole('link');
      await links.first().waitFor();
      await page.screenshot({ path: shot(`section-tabs-${name}-390`) });
      const boxes = await links.evaluateAll((as) => as.map((a) => a.getBoundingClientRect().toJSON()));
      expect(boxes.length).toBeGreaterThanOrEqual(7);
      for (const b of boxes) {
        expect(b.left).toBeGreaterThanOrEqual(0);
        expect(b.right).toBeLessThanOrEqual(PHONE.width);
        expect(b.height).toBeGreaterThanOrEqual(44);
      }
      const navBox = page.getByRole('navigation', { name: nav });
      expect(await navBox.evaluate((n) => n.scrollWidth <= n.clientWidth)).toBe(true);
      await context.close();
    });
});

describe('a finished item on a fixer’s phone', () => {
  it('leads with its outcome, and shows the cautions after it', async () => {
    const [done] = await app.db.db
      .select({ id: bookingItems.id })
      .from(bookingItems)
      .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
      .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
      .where(
        and(
          eq(bookings.eventId, eventId),
          eq(bookingItems.status, 'done'),
          eq(categories.mains, true),
          inArray(categories.slug, [
            'kettle',
            'toaster',
            'lamp',
            'iron',
            'vacuum-cleaner',
            'coffee-maker',
            'hair-dryer',
          ]),
        ),
      )
      .limit(1);
    expect(done, 'the demo day has a finished mains item').toBeDefined();
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', PHONE);
    await page.goto(`${app.server.url}/items/${done.id}`);
    const outcome = page.getByRole('heading', { name: /^Outcome:/ });
    const cautions = page.getByText('Before you open it');
    await outcome.waitFor();
    await page.screenshot({ path: shot('item-finished-390'), fullPage: true });
    const [o, c] = [await outcome.boundingBox(), await cautions.boundingBox()];
    expect(o!.y).toBeLessThan(c!.y);
    // The outcome is on the first screen of the phone.
    expect(o!.y + o!.height).toBeLessThanOrEqual(PHONE.height);
    await context.close();
  });
});
