import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { events, repairGroups } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot, screenshotDir, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';
import { writeFileSync } from 'node:fs';

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

describe('impact in the browser', () => {
  it(
    'shows the organiser the dashboard with charts and figures that lead to their records, and prints a session report',
    { timeout: 90_000 },
    async () => {
      const { context, page } = await signedIn(browser, app.server.url, 'organiser', { width: 1280, height: 900 });
      await page.goto(`${app.server.url}/groups/${groupId}/impact`);
      const fixed = page.getByTestId('stat-fixed');
      await fixed.waitFor();
      const stats = await (await context.request.get(`${app.server.url}/api/stats?groupId=${groupId}`)).json();
      expect((await fixed.textContent())!.replace(/\D/g, '')).toBe(String(stats.fixed));
      await page.locator('.recharts-surface').first().waitFor();
      expect(await page.locator('.recharts-surface').count()).toBeGreaterThanOrEqual(4);
      await page.screenshot({ path: shot('impact-dashboard'), fullPage: true });
      // The figure leads to the records it counts.
      await page.getByTestId('stat-fixed').click();
      await page.waitForURL(/\/impact\/records\?/);
      await page.getByTestId('records-filter').getByText(`${stats.fixed} items`).waitFor();
      expect(await page.getByTestId('record-row').count()).toBe(Math.min(50, stats.fixed));
      await page.screenshot({ path: shot('impact-records'), fullPage: true });

      const [past] = await app.db.db
        .select()
        .from(events)
        .where(eq(events.title, 'Kestlebridge monthly repairs'))
        .orderBy(events.startsAt)
        .limit(1);
      await page.goto(`${app.server.url}/events/${past.id}/report`);
      await page.getByTestId('report').waitFor();
      await page.locator('.recharts-surface').first().waitFor();
      await page.screenshot({ path: shot('event-report-screen'), fullPage: true });
      const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true });
      writeFileSync(`${screenshotDir}/event-report.pdf`, pdf);
      expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
      await context.close();
    },
  );

  it('shows anyone the public page and the embeddable widget, with no visitor named', { timeout: 60_000 }, async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await page.goto(`${app.server.url}/impact/groups/${groupId}`);
    await page
      .getByRole('heading', { name: /Kestlebridge Menders/ })
      .first()
      .waitFor();
    // The drawings are drawn once they are on screen (below the story on a phone): none before the visitor scrolls.
    await page.waitForTimeout(500);
    expect(await page.locator('.recharts-surface').count()).toBe(0);
    await page.getByRole('heading', { name: 'Kilograms kept out of the bin, by month' }).scrollIntoViewIfNeeded();
    await page.locator('.recharts-surface').first().waitFor();
    expect(await page.content()).not.toMatch(/@example\.org|Orla Whitcombe|Sol Marchetti/);
    await page.screenshot({ path: shot('impact-public-phone'), fullPage: true });
    const widget = await browser.newPage({ viewport: { width: 360, height: 260 } });
    const res = await widget.goto(`${app.server.url}/embed/impact?group=${groupId}`);
    expect(res!.headers()['x-frame-options']).toBeUndefined();
    expect(res!.headers()['content-security-policy']).toContain('frame-ancestors *');
    await widget.getByText(/kg/).first().waitFor();
    await widget.screenshot({ path: shot('impact-widget') });
    const normal = await widget.request.get(`${app.server.url}/impact`);
    expect(normal.headers()['x-frame-options']).toBe('SAMEORIGIN');
  });

  it(
    'lists the items waiting for parts for the organiser, and lets a visitor book a return visit from the link',
    { timeout: 60_000 },
    async () => {
      const { context, page } = await signedIn(browser, app.server.url, 'organiser', { width: 1024, height: 800 });
      await page.goto(`${app.server.url}/groups/${groupId}/follow-ups`);
      await page.getByTestId('follow-up').first().waitFor();
      await page.screenshot({ path: shot('follow-ups'), fullPage: true });
      const list = await (await context.request.get(`${app.server.url}/api/groups/${groupId}/follow-ups`)).json();
      const open = list.find((f: { status: string }) => f.status === 'open' || f.status === 'part-ordered');
      const visitor = await browser.newPage({ viewport: PHONE });
      await visitor.goto(open.rebookUrl);
      const time = visitor.getByRole('button', { name: /places? free/ }).first();
      await time.waitFor();
      await visitor.screenshot({ path: shot('rebook-phone'), fullPage: true });
      await time.click();
      await visitor.getByRole('button', { name: 'Book it' }).click();
      await visitor.getByTestId('rebook-reference').waitFor();
      const ref = (await visitor.getByTestId('rebook-reference').textContent())!.trim();
      expect(ref).toMatch(/^[2-9A-HJ-NP-Z]{3}-[2-9A-HJ-NP-Z]{3}$/);
      const after = await (await context.request.get(`${app.server.url}/api/groups/${groupId}/follow-ups`)).json();
      expect(after.find((f: { itemId: number }) => f.itemId === open.itemId).status).toBe('rebooked');
      await context.close();
      await visitor.close();
    },
  );
});
