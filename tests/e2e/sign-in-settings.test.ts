import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { DEMO_PASSWORD } from '../../shared/constants';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

/** Issue 14, finding 9, on a phone: the "Password and sign-in" card of the account page. */
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

describe('password and sign-in on a 390 px phone', () => {
  it('a fixer is told a common password will not do, then changes theirs', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
    await page.goto(`${app.server.url}/me/data`);
    const card = page.getByRole('form', { name: 'Change your password' });
    await card.waitFor();
    const save = card.getByRole('button', { name: 'Save the new password' });
    for (const target of [save, card.getByLabel('Current password'), card.getByLabel('New password', { exact: true })])
      expect((await target.boundingBox())!.height).toBeGreaterThanOrEqual(44);

    await card.getByLabel('Current password').fill(DEMO_PASSWORD);
    // "password123" is in the common-passwords list of @zxcvbn-ts/language-common.
    await card.getByLabel('New password', { exact: true }).fill('password123');
    await card.getByLabel('The new password again').fill('password123');
    await save.click();
    await card
      .getByText(/often used or have leaked/)
      .first()
      .waitFor();
    await page.screenshot({ path: shot('password-common-phone'), fullPage: true });

    await card.getByLabel('New password', { exact: true }).fill('a kettle with a bent spout');
    await card.getByLabel('The new password again').fill('a kettle with a bent spout');
    await save.click();
    await card.getByText(/Your password is changed/).waitFor();
    await page.screenshot({ path: shot('password-changed-phone'), fullPage: true });
    const width = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(width).toBeLessThanOrEqual(PHONE.width);
    await context.close();
  });
});
