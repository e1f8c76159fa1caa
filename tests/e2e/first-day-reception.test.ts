import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { events } from '../../server/src/db/schema/index';
import { TODAY_TITLE } from '../../server/src/seed/demo-today';
import { launchBrowser, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let browser: Browser;
let eventId: number;
/** The reception tablet. */
const TABLET = { width: 820, height: 1180 };
/** The 44 px goal for a target a finger presses (WCAG 2.5.5). */
const TARGET = 44;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const [e] = await app.db.db.select().from(events).where(eq(events.title, TODAY_TITLE));
  eventId = e.id;
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

/** Every link and button in the header, with its height and its text's line height. */
function headerItems(page: Page) {
  return page.locator('header a, header button').evaluateAll((nodes) =>
    nodes
      .filter((n) => n.getBoundingClientRect().height > 0)
      .map((n) => ({
        text: (n.textContent ?? '').trim() || (n.getAttribute('aria-label') ?? ''),
        height: n.getBoundingClientRect().height,
        top: n.getBoundingClientRect().top,
        padding: parseFloat(getComputedStyle(n).paddingTop) + parseFloat(getComputedStyle(n).paddingBottom),
        lineHeight: parseFloat(getComputedStyle(n).lineHeight),
      })),
  );
}

describe('the reception desk on an 820 px tablet', () => {
  it('keeps the header on one line with no wrapped item', { timeout: 60_000 }, async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'host', TABLET);
    await page.goto(`${app.server.url}/desk/${eventId}`);
    await page.getByRole('heading', { name: 'Reception desk' }).waitFor();
    await page.screenshot({ path: shot('desk-tablet-header') });

    const items = await headerItems(page);
    expect(items.length).toBeGreaterThan(1);
    for (const item of items)
      expect(item.height - item.padding, `${item.text} text height`).toBeLessThan(2 * item.lineHeight);
    // One row: every item shares the row of the logo.
    const tops = items.map((i) => i.top + i.height / 2);
    expect(Math.max(...tops) - Math.min(...tops)).toBeLessThan(items[0].lineHeight);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(TABLET.width);

    // Every link of the main navigation, wherever it shows, is one line high.
    const menu = page.getByRole('button', { name: 'Menu' });
    if (await menu.isVisible()) await menu.click();
    const links = page.getByRole('navigation', { name: 'Main' }).locator('a, button');
    const count = await links.count();
    expect(count).toBeGreaterThan(2);
    for (let i = 0; i < count; i++) {
      const link = links.nth(i);
      const box = await link.boundingBox();
      const name = (await link.textContent())!.trim();
      expect(box, name).not.toBeNull();
      const style = await link.evaluate((n) => {
        const s = getComputedStyle(n);
        return {
          lineHeight: parseFloat(s.lineHeight),
          padding: parseFloat(s.paddingTop) + parseFloat(s.paddingBottom),
        };
      });
      expect(box!.height - style.padding, `${name} text height`).toBeLessThan(2 * style.lineHeight);
    }
    await page.screenshot({ path: shot('desk-tablet-menu') });
    await context.close();
  });

  it('offers "Print this slot’s tags" as a button at least 44 px high', { timeout: 60_000 }, async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'host', TABLET);
    await page.goto(`${app.server.url}/desk/${eventId}`);
    await page.getByRole('heading', { name: 'Reception desk' }).waitFor();
    const print = page.getByRole('link', { name: 'Print this slot’s tags' }).first();
    await print.waitFor();
    const box = await print.boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(TARGET);
    expect(box!.width).toBeGreaterThanOrEqual(TARGET);
    // Styled as a button: a filled or outlined box, not underlined text.
    const look = await print.evaluate((n) => {
      const s = getComputedStyle(n);
      return {
        underline: s.textDecorationLine.includes('underline'),
        boxed: s.backgroundColor !== 'rgba(0, 0, 0, 0)' || parseFloat(s.borderTopWidth) > 0 || s.boxShadow !== 'none',
      };
    });
    expect(look).toEqual({ underline: false, boxed: true });
    await context.close();
  });
});
