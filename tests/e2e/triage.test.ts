import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../../shared/constants';
import type { RunningServer } from '../../server/src/server';
import { DESKTOP, launchBrowser, PHONE, shot } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

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

async function signIn(page: Page, who: string) {
  await page.goto(`${server.url}/sign-in`);
  await page.getByLabel('E-mail').fill(`${who}@example.org`);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
}

describe('volunteers, rota and the triage board', () => {
  it('shows the organiser the skills matrix and the rota with its gaps', { timeout: 60_000 }, async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await signIn(page, 'organiser');
    await page.waitForURL(/\/groups\/\d+\/events$/);
    await page.getByRole('link', { name: 'Skills', exact: true }).click();
    await page.getByRole('columnheader', { name: /Textiles/ }).waitFor();
    await page.getByRole('button', { name: 'Textiles' }).click();
    const first = await page.locator('tbody tr').first().locator('th').textContent();
    expect(first).toContain('Wren Ashcombe');
    await page.screenshot({ path: shot('skills-matrix'), fullPage: true });

    await page.getByRole('navigation', { name: 'Group' }).getByRole('link', { name: 'Sessions' }).click();
    await page
      .getByRole('link', { name: /Kestlebridge repair session/ })
      .first()
      .click();
    await page.getByRole('link', { name: 'Rota' }).click();
    await page.getByRole('heading', { name: 'Gaps' }).waitFor();
    await page.getByText(/No toys fixer/).waitFor();
    await page.screenshot({ path: shot('rota-gaps'), fullPage: true });
    await page.close();
  });

  it('runs triage, moves an item by hand, locks it, and the lock holds on a re-run', { timeout: 60_000 }, async () => {
    const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
    await signIn(page, 'organiser');
    await page.waitForURL(/\/groups\/\d+\/events$/);
    await page
      .getByRole('link', { name: /Kestlebridge repair session/ })
      .first()
      .click();
    await page.getByRole('link', { name: 'Triage board' }).click();
    await page.getByRole('button', { name: 'Run triage' }).click();
    await page.getByText(/Placed 9 items/).waitFor();
    await page.screenshot({ path: shot('triage-board'), fullPage: true });

    // Move the radio's card to the sewing table with Wren, and lock it.
    const card = page.locator('article').filter({ hasText: 'Radio' }).first();
    await card.getByRole('button', { name: 'Move…' }).click();
    await card.getByLabel('Fixer').selectOption({ label: 'Wren Ashcombe — no Electronics skill yet' });
    await card.getByLabel('Bench').selectOption({ label: 'Sewing table' });
    await card.getByRole('button', { name: 'Place and lock' }).click();
    const sewing = page.getByRole('region', { name: 'Sewing table' });
    const moved = sewing.locator('article').filter({ hasText: 'Radio' });
    await moved.getByText('locked').waitFor();
    // The move breaks rules, and the card says which.
    await moved.getByText(/has no electronics skill/).waitFor();

    await page.getByRole('button', { name: 'Run triage' }).click();
    await page.getByText(/Placed \d+ item/).waitFor();
    await sewing.locator('article').filter({ hasText: 'Radio' }).getByText('locked').waitFor();
    await page.screenshot({ path: shot('triage-board-locked'), fullPage: true });
    await page.close();
  });

  it('saves the session benches and seats a fixer at the new one', { timeout: 60_000 }, async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await signIn(page, 'organiser');
    await page.waitForURL(/\/groups\/\d+\/events$/);
    await page
      .getByRole('link', { name: /Kestlebridge repair session/ })
      .first()
      .click();
    await page.getByRole('link', { name: 'Benches' }).click();
    await page.getByRole('button', { name: '+ Add a bench' }).click();
    await page.getByLabel('Name').last().fill('Window table');
    await page.getByRole('button', { name: 'Save benches' }).click();
    await page.getByRole('status').filter({ hasText: 'Saved.' }).waitFor();
    await page.screenshot({ path: shot('benches'), fullPage: true });

    await page.getByRole('link', { name: 'Triage board' }).click();
    await page.getByRole('region', { name: 'Window table' }).waitFor();
    await page.getByRole('link', { name: 'Rota' }).click();
    const seat = page.getByLabel(/^Seat for /).first();
    const label = (await seat.getAttribute('aria-label'))!;
    const saved = page.waitForResponse((r) => r.request().method() === 'PATCH' && r.url().includes('/shifts/'));
    await seat.selectOption({ label: 'Window table' });
    expect((await saved).ok()).toBe(true);
    await page.reload();
    const again = page.getByLabel(label, { exact: true });
    expect(await again.locator('option:checked').textContent()).toBe('Window table');
    await page.close();
  });

  it('keeps the skills a fixer saves', { timeout: 60_000 }, async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await signIn(page, 'fixer');
    await page.waitForURL(/\/bench$/);
    await page.getByRole('link', { name: 'My skills' }).first().click();
    await page.getByLabel('Textiles').selectOption('3');
    await page.getByRole('button', { name: 'Save my skills' }).click();
    await page.getByRole('status').filter({ hasText: 'Saved.' }).waitFor();
    await page.reload();
    expect(await page.getByLabel('Textiles').inputValue()).toBe('3');
    await page.close();
  });

  it('shows a fixer their queue on a phone', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await signIn(page, 'fixer');
    await page.waitForURL(/\/bench$/);
    await page.getByRole('heading', { name: 'My queue' }).waitFor();
    await page.locator('ol li').first().waitFor();
    expect(await page.locator('ol li').count()).toBeGreaterThan(0);
    await page
      .getByText(/Mains item: unplug and prove dead/)
      .first()
      .waitFor();
    await page.screenshot({ path: shot('fixer-queue-phone'), fullPage: true });
    await page.close();
  });
});
