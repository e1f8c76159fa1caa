import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../../shared/constants';
import { setupCode } from '../../server/src/auth/setup';
import { markEmptyInstall } from '../../server/src/seed/demo';
import type { RunningServer } from '../../server/src/server';
import { DESKTOP, launchBrowser, PHONE, shot } from '../support/browser';
import { createTestDatabase } from '../support/db';
import { startDemoApp, type DemoApp } from '../support/demo-app';
import { startTestServer, TEST_SECRET } from '../support/server';

let app: DemoApp;
let server: RunningServer;
let browser: Browser;

beforeAll(async () => {
  app = await startDemoApp();
  server = app.server;
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

async function signIn(page: Page, email: string) {
  await page.goto(`${server.url}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
}

describe('the foundation in a browser', () => {
  it('shows the home page on desktop and phone, in Nunito shipped with the app', async () => {
    for (const [name, viewport] of [
      ['home-desktop', DESKTOP],
      ['home-phone', PHONE],
    ] as const) {
      const page = await browser.newPage({ viewport });
      const remote: string[] = [];
      page.on('request', (r) => {
        if (!r.url().startsWith(server.url) && !r.url().startsWith('data:')) remote.push(r.url());
      });
      await page.goto(server.url);
      await page.getByRole('heading', { level: 1, name: /Bring the broken thing/ }).waitFor();
      await page.getByRole('heading', { name: 'Kestlebridge Menders' }).waitFor();
      await page.evaluate(() => document.fonts.ready);
      expect(await page.evaluate(() => document.fonts.check('800 16px Nunito'))).toBe(true);
      expect(remote).toEqual([]);
      await page.screenshot({ path: shot(name), fullPage: true });
      await page.close();
    }
  });

  const landings = [
    {
      email: 'organiser@example.org',
      heading: 'Kestlebridge Menders',
      path: /\/groups\/\d+\/events$/,
      viewport: DESKTOP,
    },
    { email: 'fixer@example.org', heading: 'My bench', path: /\/bench$/, viewport: PHONE },
    { email: 'host@example.org', heading: 'Reception desk', path: /\/desk$/, viewport: PHONE },
    { email: 'admin@example.org', heading: 'Network admin', path: /\/admin$/, viewport: DESKTOP },
  ];
  for (const l of landings) {
    it(`signs in as ${l.email} and lands on “${l.heading}”`, async () => {
      const page = await browser.newPage({ viewport: l.viewport });
      await signIn(page, l.email);
      await page.waitForURL(l.path);
      await page.getByRole('heading', { level: 1, name: l.heading }).waitFor();
      await page.screenshot({ path: shot(`landing-${l.email.split('@')[0]}`), fullPage: true });
      await page.close();
    });
  }

  it('shows the demo accounts on the sign-in page while demo data is loaded', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await page.goto(`${server.url}/sign-in`);
    await page.getByRole('heading', { name: 'Demo accounts' }).waitFor();
    expect(await page.getByText(DEMO_PASSWORD).count()).toBeGreaterThan(0);
    await page.screenshot({ path: shot('sign-in-phone'), fullPage: true });
    await page.close();
  });

  it('lets an organiser confirm a waiting volunteer', async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await signIn(page, 'organiser@example.org');
    await page.waitForURL(/\/events$/);
    await page.getByRole('link', { name: 'People' }).click();
    await page.getByText('Juniper Oakes').waitFor();
    await page.getByRole('button', { name: 'Confirm' }).click();
    await page.getByText('Nobody is waiting').waitFor();
    await page.close();
  });

  it('mails a password reset link that an admin can read in the local mailbox', async () => {
    const visitor = await browser.newPage({ viewport: PHONE });
    await visitor.goto(`${server.url}/forgot-password`);
    await visitor.getByLabel('E-mail').fill('fixer@example.org');
    await visitor.getByRole('button', { name: 'Send the link' }).click();
    await visitor.getByText('If that address has an account').waitFor();
    await visitor.close();

    const page = await browser.newPage({ viewport: DESKTOP });
    await signIn(page, 'admin@example.org');
    await page.waitForURL(/\/admin$/);
    await page.goto(`${server.url}/admin/mailbox`);
    await page.getByText('Reset your Mendery password').first().click({ timeout: 15_000 });
    const frame = page.frameLocator('iframe[title="Rendered mail"]');
    await frame.getByText('Choose a new password').waitFor();
    await page.screenshot({ path: shot('admin-mailbox'), fullPage: true });
    await page.getByRole('tab', { name: 'Plain text' }).click();
    const text = await page.locator('pre').textContent();
    const link = /http\S+\/reset-password\?token=\S+/.exec(text ?? '')?.[0];
    expect(link).toBeTruthy();

    // Following the link from the mail sets a new password.
    const owner = await browser.newPage({ viewport: PHONE });
    expect(link!.startsWith(`${server.url}/reset-password?token=`)).toBe(true);
    await owner.goto(link!);
    await owner.getByLabel('New password').fill('a fresh fixer secret');
    await owner.getByLabel('The same again').fill('a fresh fixer secret');
    await owner.getByRole('button', { name: 'Save the new password' }).click();
    await owner.waitForURL(/\/sign-in/);
    await owner.close();
    await page.close();
  });
});

describe('an empty installation', () => {
  it('asks for the first admin and signs them in', async () => {
    const empty = await createTestDatabase();
    await markEmptyInstall(empty.db);
    const s = await startTestServer(empty.url);
    try {
      const page = await browser.newPage({ viewport: DESKTOP });
      await page.goto(`${s.url}/sign-in`);
      await page.waitForURL(/\/setup$/);
      await page.getByRole('button', { name: 'Create the admin account' }).click();
      await page.getByText('Enter your name.').waitFor();
      await page.screenshot({ path: shot('setup-errors'), fullPage: true });
      await page.getByLabel('Setup code').fill(setupCode(TEST_SECRET));
      await page.getByLabel('Your name').fill('Olwen Firstadmin');
      await page.getByLabel('E-mail').fill('olwen@example.org');
      await page.getByLabel('Password', { exact: true }).fill('first admin secret');
      await page.getByLabel('The same again').fill('first admin secret');
      await page.getByRole('button', { name: 'Create the admin account' }).click();
      await page.getByRole('heading', { level: 1, name: 'Network admin' }).waitFor();
      expect(await page.getByRole('heading', { name: 'Demo accounts' }).count()).toBe(0);
      await page.close();
    } finally {
      await s.stop();
      await empty.drop();
    }
  });
});
