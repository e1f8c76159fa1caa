import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { events, repairGroups } from '../../server/src/db/schema/index';
import { launchBrowser, DESKTOP, PHONE, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let browser: Browser;
let groupId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const [g] = await app.db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
  groupId = g.id;
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

describe('impact on the first day', () => {
  it('asks for no figures when the dates are the wrong way round, and says why', { timeout: 60_000 }, async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    const statsRequests: string[] = [];
    page.on('request', (r) => {
      if (new URL(r.url()).pathname === '/api/stats') statsRequests.push(r.url());
    });
    await page.goto(`${app.server.url}/groups/${groupId}/impact?from=2026-06-30&to=2026-01-01`);
    await page.getByText('The end date is before the start date.').first().waitFor();
    await page.getByRole('heading', { name: 'Method and sources' }).waitFor();
    await page.waitForLoadState('networkidle');
    expect(statsRequests).toEqual([]);
    // Typing the dates the wrong way round on the page asks for nothing either.
    await page.goto(`${app.server.url}/groups/${groupId}/impact?from=2026-01-01`);
    await page.getByTestId('stat-fixed').waitFor();
    await page.waitForLoadState('networkidle');
    statsRequests.length = 0;
    await page.getByLabel('To', { exact: true }).fill('2025-06-01');
    await page.getByText('The end date is before the start date.').first().waitFor();
    await page.waitForLoadState('networkidle');
    expect(statsRequests).toEqual([]);
    await context.close();
  });

  it('leads the admin from the network admin page to the network impact page', { timeout: 60_000 }, async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'admin', DESKTOP);
    await page.goto(`${app.server.url}/admin`);
    await page.getByRole('main').getByRole('link', { name: 'Network impact' }).click();
    await page.waitForURL(/\/admin\/impact$/);
    await page.getByRole('heading', { name: 'Network impact' }).waitFor();
    await page.getByRole('navigation').getByRole('link', { name: 'Network impact' }).first().waitFor();
    await context.close();
  });

  it('shows funders and the public no figure marked "from memory"', { timeout: 60_000 }, async () => {
    const [past] = await app.db.db
      .select()
      .from(events)
      .where(eq(events.title, 'Kestlebridge monthly repairs'))
      .orderBy(events.startsAt)
      .limit(1);
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    for (const url of [`/events/${past.id}/report`, `/groups/${groupId}/report`]) {
      await page.goto(`${app.server.url}${url}`);
      await page.getByTestId('report').waitFor();
      await page.getByText(/Displacement factor/).waitFor();
      expect(await page.locator('body').innerText()).not.toMatch(/from memory/i);
    }
    // The demo's clothing weight has no published source: the report calls it an estimate in plain words.
    await page
      .getByText(/Estimate: a typical weight, not a published figure/)
      .first()
      .waitFor();
    // The dashboard's method section keeps the provenance.
    await page.goto(`${app.server.url}/groups/${groupId}/impact`);
    await page.getByRole('heading', { name: 'Method and sources' }).waitFor();
    expect(await page.locator('body').innerText()).toMatch(/from memory/i);
    await context.close();
    const visitor = await browser.newPage({ viewport: PHONE });
    for (const url of ['/impact', `/impact/groups/${groupId}`]) {
      await visitor.goto(`${app.server.url}${url}`);
      await visitor
        .getByText(/Displacement factor/)
        .first()
        .waitFor();
      expect(await visitor.locator('body').innerText()).not.toMatch(/from memory/i);
    }
    await visitor.close();
  });
});
