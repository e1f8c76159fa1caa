import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { eq } from 'drizzle-orm';
import { repairGroups } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let browser: Browser;
let groupId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  [{ id: groupId }] = await app.db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

/** A sheet of the group's own, before Mendery: semicolons, its own column names; row 4 has a date written wrongly. */
const SHEET = [
  'Nr;Datum;Was;Ergebnis;Fehler',
  '1;2021-02-06;Kettle;Fixed;No power',
  '2;2021-02-06;Lamp;End of life;Cracked base',
  '3;06/02/2021;Toaster;Fixed;Burns one side',
].join('\n');

describe('bringing in earlier records on a phone', () => {
  it('reads a sheet, takes the organiser’s column matching, shows progress to the end and the row it left out', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', PHONE);
    await page.goto(`${app.server.url}/groups/${groupId}/impact`);
    await page.getByRole('link', { name: 'Bring in earlier records' }).click();
    await page
      .getByRole('heading', { name: '1. Choose a file' })
      .waitFor({ timeout: 10_000 })
      .catch(async (e) => {
        await page.screenshot({ path: shot('import-debug'), fullPage: true });
        throw e;
      });
    await page
      .getByLabel('CSV file')
      .setInputFiles({ name: 'old-records.csv', mimeType: 'text/csv', buffer: Buffer.from(SHEET) });
    await page.getByText('A spreadsheet of your own').waitFor();
    await page.getByLabel('Record number (needed)').selectOption('Nr');
    await page.getByLabel('Session date (needed)').selectOption('Datum');
    await page.getByLabel('Outcome (needed)').selectOption('Ergebnis');
    await page.getByLabel('Your kind of item').selectOption('Was');
    await page.getByLabel('Fault', { exact: true }).selectOption('Fehler');
    await page.screenshot({ path: shot('import-matching-390'), fullPage: true });
    await page.getByRole('button', { name: 'Bring the records in' }).click();
    const bar = page.getByRole('progressbar', { name: /old-records\.csv/ });
    await expect.poll(() => bar.getAttribute('aria-valuenow'), { timeout: 15_000 }).toBe('100');
    await page.getByText('Finished · old-records.csv').waitFor();
    const row = page.getByRole('row').filter({ hasText: 'is not a date' });
    expect(await row.getByRole('cell').allTextContents()).toEqual([
      '4',
      'Session date',
      '"06/02/2021" is not a date written as YYYY-MM-DD.',
    ]);
    await page.screenshot({ path: shot('import-done-390'), fullPage: true });
    // Nothing wider than the phone.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    await context.close();
  });
});
