import { and, asc, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { events } from '../../server/src/db/schema/index';
import { DESKTOP, launchBrowser, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let browser: Browser;
/** The demo's next Kestlebridge session: five benches, four fixers coming, nine bookings. */
let eventId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const [e] = await app.db.db
    .select()
    .from(events)
    .where(and(eq(events.title, 'Kestlebridge repair session'), eq(events.status, 'published')))
    .orderBy(asc(events.startsAt));
  eventId = e.id;
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

describe('the organiser’s triage board at 1280 px', () => {
  it('fits the window, or scrolls inside a labelled board that says so and scrolls by keyboard', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    await page.goto(`${app.server.url}/events/${eventId}/board`);
    await page.getByRole('button', { name: 'Run triage' }).waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(DESKTOP.width);

    const board = page.getByRole('region', { name: /^Triage board/ });
    await board.waitFor();
    const size = await board.evaluate((el) => ({ scroll: el.scrollWidth, client: el.clientWidth }));
    const hint = page.getByText(/scroll the board sideways/);
    await page.screenshot({ path: shot('triage-board-1280'), fullPage: true });
    if (size.scroll > size.client) {
      // Wider than the window: the hint shows, and the board takes the focus and scrolls with the arrow keys.
      await hint.waitFor();
      expect(await board.getAttribute('aria-describedby')).toBe(await hint.getAttribute('id'));
      await board.focus();
      for (let i = 0; i < 5; i++) await page.keyboard.press('ArrowRight');
      await expect.poll(() => board.evaluate((el) => el.scrollLeft)).toBeGreaterThan(0);
    } else {
      expect(await hint.count()).toBe(0);
    }
    await context.close();
  });

  it('says in words how each fixer in the picker stands in the skill the item needs', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    await page.goto(`${app.server.url}/events/${eventId}/board`);
    const card = page.locator('article').filter({ hasText: 'Radio' }).first();
    await card.getByRole('button', { name: 'Move…' }).click();
    const picker = card.getByLabel('Fixer');
    const options = await picker.locator('option').allTextContents();
    expect(options.length).toBeGreaterThan(1);
    // No bare number in brackets: the level is in words (skills are 1 learning, 2 capable, 3 expert; 0 none).
    for (const o of options) expect(o).not.toMatch(/\(\D+ \d\)/);
    // Wren has textiles and jewellery only (server/src/seed/demo-volunteers.ts); Idris is capable in electronics.
    expect(options).toContain('Wren Ashcombe — no Electronics skill yet');
    expect(options).toContain('Idris Pellow — Electronics: capable');
    // The closed picker may cut the words off; the chosen fixer's whole line shows beside it and is read with it.
    await picker.selectOption({ label: 'Wren Ashcombe — no Electronics skill yet' });
    const described = (await picker.getAttribute('aria-describedby'))!;
    expect(await page.locator(`[id="${described}"]`).textContent()).toBe('Wren Ashcombe — no Electronics skill yet');
    await page.screenshot({ path: shot('triage-fixer-picker') });
    await context.close();
  });

  it('reads an earlier run back as a summary in words and tables, its stored data only behind a disclosure', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    await page.goto(`${app.server.url}/events/${eventId}/board`);
    await page.getByRole('button', { name: 'Run triage' }).click();
    await page.getByText(/Placed \d+ items?/).waitFor();
    await page.getByText(/Earlier runs/).click();
    // Whatever the link says, follow it in this tab.
    const link = page.locator('details li a').first();
    await page.goto(new URL((await link.getAttribute('href'))!, app.server.url).href);

    await page.getByRole('heading', { name: 'What came out' }).waitFor();
    expect(await page.locator('body').innerText()).not.toMatch(/"assignments"|"volunteerId"|\{\s*"/);
    const placed = page.getByRole('table', { name: 'Who takes which item, and where' });
    expect(await placed.getByRole('row').count()).toBeGreaterThan(1);
    // No fixer coming has the toys skill (server/src/seed/demo-volunteers.ts): the toy waits, and the page says why.
    const waiting = page.getByRole('table', { name: 'Items left waiting, and why' });
    await waiting
      .getByRole('row', { name: /Electric or battery toy/ })
      .getByText('No fixer with the skill')
      .waitFor();
    // What went in: the items, the four fixers with their levels in words, the five benches, the rules.
    const fixers = page.getByRole('table', { name: 'Fixers the run could use' });
    expect(await fixers.getByRole('row').count()).toBe(1 + 4);
    await fixers
      .getByRole('row', { name: /Wren Ashcombe/ })
      .getByText('Textiles (expert), Jewellery (capable)')
      .waitFor();
    expect(await page.getByRole('table', { name: 'Benches the run could use' }).getByRole('row').count()).toBe(1 + 5);
    await page.getByRole('heading', { name: 'Rules the run kept' }).waitFor();
    await page.screenshot({ path: shot('triage-run-summary'), fullPage: true });

    // The stored data stays available, folded away.
    const raw = page.getByLabel('Stored data');
    expect(await raw.isVisible()).toBe(false);
    await page.getByText(/Technical details/).click();
    expect(JSON.parse((await raw.textContent())!).result.assignments.length).toBeGreaterThan(0);
    await context.close();
  });
});
