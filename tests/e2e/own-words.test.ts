import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
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

describe('an item that cannot be mended, in Mendery’s own words', () => {
  it(
    'asks why in our words and order, with a line of help each, and shows the answer on the item page',
    { timeout: 60_000 },
    async () => {
      const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
      const queue = (await (await page.request.get(`${app.server.url}/api/me/queue`)).json()) as {
        itemId: number;
        status: string;
      }[];
      const item = queue.find((i) => i.status === 'checked-in' || i.status === 'waiting')!;
      await page.goto(`${app.server.url}/items/${item.itemId}`);
      await page.getByRole('button', { name: 'Start repair' }).click();
      const take = page.getByRole('button', { name: 'Take it' });
      if (await take.isVisible()) await take.click();
      await page.getByRole('heading', { name: 'Record the outcome' }).waitFor();
      const outcomes = page.getByRole('radiogroup', { name: 'Outcome' });
      expect(await outcomes.getByText('End of life').count()).toBe(0);
      await outcomes.getByText('Beyond mending', { exact: true }).click();

      const why = page.getByRole('group', { name: 'Why can’t it be mended?' });
      await why.waitFor();
      expect(await why.getByRole('radio').count()).toBe(6);
      const labels = await why.locator('label > span > span:first-child').allInnerTexts();
      expect(labels).toEqual([
        'Worn past use',
        'We couldn’t get inside',
        'It needs a tool we lack',
        'No guide or diagram to go by',
        'The part can’t be had',
        'The part costs too much',
      ]);
      // The open standard's list stays in its file: none of its six texts shows on the form.
      const form = await page.locator('main').innerText();
      for (const t of ['Spare parts not available', 'No way to open', 'Lack of equipment', 'too worn out'])
        expect(form).not.toContain(t);
      // Each choice is a whole row to tap on a phone.
      for (const box of await why.locator('label').evaluateAll((ls) => ls.map((l) => l.getBoundingClientRect().height)))
        expect(box).toBeGreaterThanOrEqual(44);
      await page.getByRole('button', { name: 'Save outcome' }).click();
      expect(await page.getByText('Choose why it can’t be mended.').isVisible()).toBe(true);
      await why.getByRole('radio', { name: /We couldn’t get inside/ }).check();
      await why.screenshot({ path: shot('own-words-beyond-mending-phone') });
      await page.getByRole('button', { name: 'Save outcome' }).click();
      await page.getByRole('heading', { name: 'Outcome: Beyond mending' }).waitFor();
      expect(await page.getByText('Why: We couldn’t get inside').isVisible()).toBe(true);
      await context.close();
    },
  );
});
