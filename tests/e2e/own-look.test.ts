import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { repairGroups } from '../../server/src/db/schema/index';
import { DESKTOP, launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let browser: Browser;
let groupId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  [{ id: groupId }] = await app.db.db
    .select({ id: repairGroups.id })
    .from(repairGroups)
    .where(eq(repairGroups.slug, 'kestlebridge-menders'));
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const oneDp = new Intl.NumberFormat('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const whole = new Intl.NumberFormat('en-GB');

/** Anything a keyboard reaches inside a part hidden from screen readers. */
const focusableInHidden = (page: Page) =>
  page.locator('[aria-hidden="true"], [aria-hidden=""]').evaluateAll((nodes) =>
    nodes
      .flatMap((n) => Array.from(n.querySelectorAll('a[href], button, input, select, textarea, [tabindex]')))
      .filter((n) => n.getAttribute('tabindex') !== '-1')
      .map((n) => n.outerHTML.slice(0, 160)),
  );

describe('the public figures in Mendery’s own composition', () => {
  for (const viewport of [PHONE, DESKTOP])
    it(`tells the figures in sentences beside a quilt, not as a row of tiles, at ${viewport.width} px`, async () => {
      const page = await browser.newPage({ viewport });
      const d = await (await page.request.get(`${app.server.url}/api/public/impact?groupId=${groupId}`)).json();
      await page.goto(`${app.server.url}/impact/groups/${groupId}`);
      const story = page.getByRole('region', { name: 'The story so far' });
      await story.waitFor();
      await page.screenshot({ path: shot(`impact-public-${viewport.width}`), fullPage: true });
      // Every figure is still there, in the words of a sentence.
      expect(await page.getByTestId('stat-items').innerText()).toBe(whole.format(d.items));
      expect(await page.getByTestId('stat-fixed').innerText()).toBe(whole.format(d.fixed));
      expect(await page.getByTestId('stat-events').innerText()).toBe(whole.format(d.events));
      expect(await page.getByTestId('stat-kgDiverted').innerText()).toBe(oneDp.format(d.kgDiverted));
      expect(await page.getByTestId('stat-co2eKg').innerText()).toBe(oneDp.format(d.co2eKg));
      const sentence = await page.getByTestId('stat-items').locator('xpath=ancestor::p[1]').innerText();
      expect(sentence).toMatch(
        new RegExp(`${whole.format(d.items)} things in need of mending.*${whole.format(d.fixed)}`),
      );
      expect(await page.getByTestId('story-fixed').innerText()).toContain(`Fixed: ${whole.format(d.fixed)}`);
      expect(await page.getByTestId('story-end-of-life').innerText()).toContain(
        `Beyond mending: ${whole.format(d.endOfLife)}`,
      );
      // No list of big-number tiles is left.
      expect(await page.getByRole('region', { name: 'Totals' }).count()).toBe(0);
      expect(await story.locator('svg[aria-hidden="true"] rect').count()).toBeGreaterThanOrEqual(20);
      expect(await focusableInHidden(page)).toEqual([]);
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(viewport.width);
      await page.close();
    });

  it('puts the same figures in one sentence in the piece for other websites, within 360 × 260', async () => {
    const page = await browser.newPage({ viewport: { width: 360, height: 260 } });
    const d = await (await page.request.get(`${app.server.url}/api/public/impact?groupId=${groupId}`)).json();
    await page.goto(`${app.server.url}/embed/impact?group=${groupId}`);
    await page.getByTestId('widget-fixed').waitFor();
    await page.screenshot({ path: shot('impact-widget-own') });
    expect(await page.getByTestId('widget-fixed').innerText()).toBe(whole.format(d.fixed));
    expect(await page.getByTestId('widget-kg').innerText()).toBe(oneDp.format(d.kgDiverted));
    expect(await page.getByTestId('widget-co2e').innerText()).toBe(oneDp.format(d.co2eKg));
    const sentence = await page.getByTestId('widget-fixed').locator('xpath=ancestor::p[1]').innerText();
    expect(sentence).toContain('things mended so far');
    const fits = await page
      .getByTestId('impact-widget')
      .evaluate((n) => n.scrollHeight <= n.clientHeight && n.scrollWidth <= n.clientWidth);
    expect(fits).toBe(true);
    expect(await focusableInHidden(page)).toEqual([]);
    await page.close();
  });

  it('offers the organiser the figures for their own website in our words', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    await page.goto(`${app.server.url}/groups/${groupId}/impact`);
    await page.getByRole('button', { name: 'Show the figures on your own website' }).click();
    await page.getByRole('heading', { name: 'Your figures on your own website' }).waitFor();
    expect(await page.locator('main').innerText()).not.toMatch(/embed/i);
    await context.close();
  });
});

describe('the month calendar in Mendery’s own look', () => {
  for (const viewport of [PHONE, DESKTOP])
    it(`names the months either side on its buttons and rings today’s date, at ${viewport.width} px`, async () => {
      const page = await browser.newPage({ viewport });
      await page.goto(`${app.server.url}/events?view=calendar`);
      await page.locator('.fc-daygrid-event').first().waitFor();
      await page.screenshot({ path: shot(`events-calendar-own-${viewport.width}`), fullPage: true });
      const month = (offset: number) => {
        const now = new Date();
        return new Intl.DateTimeFormat('en-GB', { month: 'long' }).format(
          new Date(now.getFullYear(), now.getMonth() + offset, 1),
        );
      };
      // No stock toolbar: our own header with words.
      expect(await page.locator('.fc-toolbar, .fc-today-button').count()).toBe(0);
      const next = page.getByRole('button', { name: /^Next month/ });
      expect(await next.innerText()).toContain(month(1));
      expect(await page.getByRole('button', { name: /^Previous month/ }).innerText()).toContain(month(-1));
      expect(await page.locator('.fc-day-today .mendery-today-mark').count()).toBe(1);
      expect(await page.locator('.fc-day-today').evaluate((n) => getComputedStyle(n).backgroundColor)).toBe(
        'rgba(0, 0, 0, 0)',
      );
      // Chips carry their colour on the edge and dark text on white.
      const chip = await page
        .locator('.fc-daygrid-event')
        .first()
        .evaluate((n) => ({
          bg: getComputedStyle(n).backgroundColor,
          edge: getComputedStyle(n.firstElementChild!.firstElementChild!).borderLeftWidth,
        }));
      expect(chip.bg).toBe('rgb(255, 255, 255)');
      expect(chip.edge).toBe('4px');
      await next.click();
      await page.getByText(`Back to ${month(0)}`).click();
      expect(await page.locator('.fc-day-today').count()).toBe(1);
      await page.close();
    });
});
