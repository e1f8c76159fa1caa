import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { HAZARD_REFUSALS } from '../../shared/booking/screening';
import { bookingItems, bookings, events, groupExclusions } from '../../server/src/db/schema/index';
import { TODAY_TITLE } from '../../server/src/seed/demo-today';
import { categoryId } from '../support/factories';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let browser: Browser;
let eventId: number;
let groupId: number;
const TABLET = { width: 1024, height: 768 };

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const [e] = await app.db.db.select().from(events).where(eq(events.title, TODAY_TITLE));
  eventId = e.id;
  groupId = e.groupId;
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const walkInCount = async () =>
  (await app.db.db.select().from(bookings).where(eq(bookings.eventId, eventId))).filter((b) => b.walkIn).length;

describe('event-day rules in the browser', () => {
  it(
    'the walk-in form asks the screening questions and refuses a kind the group excludes before submit, saying why; a kind it takes still checks in',
    { timeout: 90_000 },
    async () => {
      const microwave = await categoryId(app.db.db, 'microwave');
      const lamp = await categoryId(app.db.db, 'lamp');
      // The demo group already refuses microwave ovens; the test says so itself rather than lean on the seed.
      await app.db.db
        .insert(groupExclusions)
        .values({ groupId, categoryId: microwave })
        .onDuplicateKeyUpdate({ set: { groupId } });
      const before = await walkInCount();

      const { context, page } = await signedIn(browser, app.server.url, 'host', TABLET);
      const walkInPosts: string[] = [];
      page.on('request', (r) => {
        if (r.method() === 'POST' && r.url().endsWith('/walk-ins')) walkInPosts.push(r.url());
      });
      await page.goto(`${app.server.url}/desk/${eventId}`);
      await page.getByRole('button', { name: 'New walk-in' }).click();
      const form = page.getByRole('form', { name: 'Walk-in' });
      await form.waitFor();

      // The same three questions as the booking form.
      for (const h of Object.values(HAZARD_REFUSALS)) await form.getByLabel(h.question).waitFor();

      await form.getByLabel('Visitor’s name').fill('Rowan Ashby');
      await form.getByLabel('Kind of item').selectOption(String(microwave));
      await form.getByLabel('What is wrong?').fill('Turntable spins but the food stays cold.');
      await form.getByLabel('The visitor has read and accepts the house rules').check();
      await form.getByLabel('Name typed by the person accepting').fill('Rowan Ashby');

      // Refused before anything is sent, with the kind's own reason.
      const refusal = form.getByRole('alert').filter({ hasText: /microwave/i });
      await refusal.waitFor();
      expect(await form.getByLabel('Kind of item').locator('option:checked').textContent()).toMatch(/not taken/);
      expect(await form.getByRole('button', { name: 'Check in walk-in' }).isDisabled()).toBe(true);
      await page.screenshot({ path: shot('desk-walk-in-refused'), fullPage: true });

      // A kind the group takes, but with a swollen battery: refused for the hazard.
      await form.getByLabel('Kind of item').selectOption(String(lamp));
      await refusal.waitFor({ state: 'detached' });
      await form.getByLabel(HAZARD_REFUSALS['swollen-battery'].question).check();
      await form.getByText(HAZARD_REFUSALS['swollen-battery'].reason).waitFor();
      expect(await form.getByRole('button', { name: 'Check in walk-in' }).isDisabled()).toBe(true);
      expect(walkInPosts).toHaveLength(0);
      expect(await walkInCount()).toBe(before);

      // Without the hazard the lamp checks in.
      await form.getByLabel(HAZARD_REFUSALS['swollen-battery'].question).uncheck();
      await form.getByRole('button', { name: 'Check in walk-in' }).click();
      await page.getByTestId('issued-tag').first().waitFor();
      expect(await walkInCount()).toBe(before + 1);
      await context.close();
    },
  );

  it(
    "the fixer's queue shows an item's new state as soon as its outcome is recorded, without a reload",
    { timeout: 90_000 },
    async () => {
      const [toaster] = await app.db.db
        .select({ id: bookingItems.id })
        .from(bookingItems)
        .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
        .where(eq(bookings.reference, 'T4M-8RS'));
      const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
      await page.goto(`${app.server.url}/bench`);
      const queue = page.getByRole('region', { name: 'My queue' });
      const inQueue = queue.getByRole('link', { name: 'Toaster or grill' });
      await inQueue.waitFor();

      // Through the app's own links only: the queue's cached answer is what the fixer would see.
      await inQueue.click();
      await page.waitForURL(new RegExp(`/items/${toaster.id}$`));
      await page.getByRole('button', { name: 'Start repair' }).click();
      const take = page.getByRole('button', { name: 'Take it' });
      if (await take.isVisible()) await take.click();
      await page.getByRole('heading', { name: 'Record the outcome' }).waitFor();
      await page.getByRole('radiogroup', { name: 'Outcome' }).getByText('Advice given', { exact: true }).click();
      await page.getByLabel('Time spent (minutes)').fill('15');
      await page.getByRole('button', { name: 'Save outcome' }).click();
      await page.getByRole('heading', { name: 'Outcome: Advice given' }).waitFor();

      await page.getByRole('link', { name: 'My bench' }).first().click();
      await page.waitForURL(/\/bench$/);
      // Done items leave the queue; well within the queue's own 30-second refresh.
      await inQueue.waitFor({ state: 'detached', timeout: 10_000 });
      expect(await queue.getByRole('link', { name: 'Toaster or grill' }).count()).toBe(0);
      await page.screenshot({ path: shot('fixer-queue-after-outcome-phone'), fullPage: true });
      await context.close();
    },
  );
});
