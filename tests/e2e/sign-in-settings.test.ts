import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { DEMO_PASSWORD } from '../../shared/constants';
import { totpCodeAt } from '../../server/src/auth/totp';
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

  it('an admin sets up two-step sign-in with the key shown, then signs in with a code', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'admin', PHONE);
    await page.goto(`${app.server.url}/me/data`);
    const start = page.getByRole('button', { name: 'Set up two-step sign-in' });
    expect((await start.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    await start.click();
    const setup = page.getByRole('form', { name: 'Set up two-step sign-in' });
    await setup.getByRole('img', { name: /QR code/ }).waitFor();
    const key = (await setup.getByTestId('totp-key').textContent())!.trim();
    expect(key).toMatch(/^[A-Z2-7]{32}$/);
    await page.screenshot({ path: shot('two-factor-setup-phone'), fullPage: true });

    await setup.getByLabel('Code from your app').fill('000000');
    await setup.getByRole('button', { name: 'Turn on two-step sign-in' }).click();
    await setup
      .getByText(/That code is not right/)
      .first()
      .waitFor();
    const now = Math.floor(Date.now() / 1000);
    await setup.getByLabel('Code from your app').fill(await totpCodeAt(key, now));
    await setup.getByRole('button', { name: 'Turn on two-step sign-in' }).click();
    await page.getByText('Two-step sign-in is on. Keep your app').waitFor();
    await page.getByRole('form', { name: 'Turn off two-step sign-in' }).waitFor();
    await context.close();

    // A new browser: the password alone is not enough, the code from the app is.
    const again = await browser.newContext({ viewport: PHONE });
    const p2 = await again.newPage();
    await p2.goto(`${app.server.url}/sign-in`);
    await p2.getByLabel('E-mail').fill('admin@example.org');
    await p2.getByLabel('Password').fill(DEMO_PASSWORD);
    await p2.getByRole('button', { name: 'Sign in', exact: true }).click();
    const code = p2.getByLabel('Code from your app');
    await code.waitFor();
    expect((await code.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    await p2.screenshot({ path: shot('two-factor-sign-in-phone'), fullPage: true });
    expect((await p2.evaluate(() => fetch('/api/auth/me').then((r) => r.json()))).user).toBeNull();
    await code.fill(await totpCodeAt(key, now + 30));
    await p2.getByRole('button', { name: 'Sign in', exact: true }).click();
    await p2.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
    expect((await p2.evaluate(() => fetch('/api/auth/me').then((r) => r.json()))).user.email).toBe('admin@example.org');
    await again.close();
  });
});
