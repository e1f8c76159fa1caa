import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { bookingItems, bookings, salvageParts } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

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

describe('the fixer’s toolkit at phone width', () => {
  it(
    'searches the repair notes, opens a calculator from an item page and takes a salvaged part',
    { timeout: 90_000 },
    async () => {
      const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);

      await page.goto(`${app.server.url}/toolkit/knowledge`);
      await page.getByLabel('Symptom or words').fill('steam switch');
      await page.getByRole('button', { name: 'Search' }).click();
      await page.getByTestId('knowledge-entry').first().waitFor();
      expect(await page.getByTestId('knowledge-entry').first().textContent()).toMatch(/Kettle/);
      await page.screenshot({ path: shot('knowledge-search-phone'), fullPage: true });

      // The toaster waiting at today's session: planned for this fixer.
      const [toaster] = await app.db.db
        .select({ id: bookingItems.id })
        .from(bookingItems)
        .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
        .where(eq(bookings.reference, 'T4M-8RS'));
      await page.goto(`${app.server.url}/items/${toaster.id}`);
      await page.getByRole('heading', { name: 'Similar past repairs' }).waitFor();
      await page.getByRole('button', { name: 'Start repair' }).click();
      const take = page.getByRole('button', { name: 'Take it' });
      if (await take.isVisible()) await take.click();
      await page.getByRole('heading', { name: 'Record the outcome' }).waitFor();

      await page.getByRole('link', { name: 'Capacitor discharge' }).click();
      await page.waitForURL(/\/toolkit\/calculators\?open=discharge/);
      const calc = page.getByTestId('calc-discharge');
      await calc.waitFor();
      await calc
        .getByRole('button', { name: /example/i })
        .first()
        .click();
      await page.getByTestId('result-discharge').waitFor();
      expect(await page.getByTestId('result-discharge').textContent()).toMatch(/\d/);
      await page.screenshot({ path: shot('calculator-discharge-phone'), fullPage: true });
      await page.goBack();

      const form = page.getByRole('form', { name: 'Find a substitute' });
      await form.waitFor();
      await form.getByLabel('Part needed').selectOption('fuse');
      await form.getByLabel('Current (A)').fill('13');
      await form.getByRole('button', { name: 'Look in the stock' }).click();
      const candidate = page.getByTestId('substitute').filter({ hasText: '13 A ceramic plug fuse' });
      await candidate.waitFor();
      await candidate.getByRole('button', { name: 'Take one for this item' }).click();
      await page
        .getByRole('list', { name: 'Parts used' })
        .getByText(/13 A ceramic plug fuse/)
        .waitFor();
      await page.screenshot({ path: shot('item-salvage-phone'), fullPage: true });
      const [fuse] = await app.db.db
        .select()
        .from(salvageParts)
        .where(eq(salvageParts.value, '13 A ceramic plug fuse'));
      expect(fuse.quantity).toBe(5);
      await context.close();
    },
  );
});
