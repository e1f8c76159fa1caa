import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import type { RunningServer } from '../../server/src/server';
import { launchBrowser, PHONE, shot } from '../support/browser';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/* First-day rough edges (issue 12): the signed-out check, the phone menu, a missing session, a dead booking code. */

let db: TestDatabase;
let server: RunningServer;
let browser: Browser;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
  await db?.drop();
});

/** A phone-sized page that records every console error and uncaught exception. */
async function phonePage() {
  const page = await browser.newPage({ viewport: PHONE });
  const errors: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') errors.push(`${m.text()} (${m.location().url})`);
  });
  page.on('pageerror', (e) => errors.push(e.message));
  return { page, errors };
}

const mainText = (page: Page) => page.locator('main').innerText();

describe('first-day rough edges in a browser', () => {
  it('an anonymous visit to the home page and the sessions list logs no console error', async () => {
    const { page, errors } = await phonePage();
    await page.goto(server.url);
    await page.getByRole('heading', { level: 1 }).first().waitFor();
    await page.goto(`${server.url}/events`);
    await page.getByRole('heading', { level: 1 }).first().waitFor();
    await page.waitForLoadState('networkidle');
    expect(errors).toEqual([]);
    await page.close();
  });

  it('at 390 px the menu closes on Escape and gives the focus back to the menu button', async () => {
    const { page } = await phonePage();
    await page.goto(`${server.url}/events`);
    const menu = page.getByRole('button', { name: 'Menu' });
    await menu.click();
    expect(await menu.getAttribute('aria-expanded')).toBe('true');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sessions' }).waitFor();
    await page.keyboard.press('Escape');
    expect(await menu.getAttribute('aria-expanded')).toBe('false');
    expect(await menu.evaluate((el) => el === document.activeElement)).toBe(true);
    await page.close();
  });

  it('a session that does not exist says so in one word and links back to the sessions list', async () => {
    const { page } = await phonePage();
    await page.goto(`${server.url}/events/999`);
    await page.getByText('Session not found').waitFor();
    expect(await mainText(page)).not.toMatch(/\bevent\b/i);
    await page.screenshot({ path: shot('i12a-session-not-found'), fullPage: true });
    await page.getByRole('link', { name: 'See all sessions' }).click();
    await page.waitForURL(`${server.url}/events`);
    await page.close();
  });

  it('an unknown booking code says it is not found, with a way to the sessions list, and shows nothing for the desk', async () => {
    const { page } = await phonePage();
    await page.goto(`${server.url}/b/ZZZ-ZZZ`);
    await page.getByText('Booking not found').waitFor();
    expect(await mainText(page)).not.toContain('Show this code at the reception desk');
    await page.screenshot({ path: shot('i12a-booking-code-unknown'), fullPage: true });
    await page.getByRole('link', { name: 'See all sessions' }).click();
    await page.waitForURL(`${server.url}/events`);
    await page.close();
  });

  it('a cancelled booking code says it is cancelled and shows no code for the desk; a standing one still does', async () => {
    const groupId = await makeGroup(db.db);
    const { slotIds } = await makeEvent(db.db, groupId);
    const kettle = await categoryId(db.db, 'kettle');
    const anon = new Agent(server.url);
    const book = () =>
      anon.post('/api/bookings', {
        slotId: slotIds[0],
        visitor: visitor(),
        items: [{ categoryId: kettle, fault: 'Does not heat' }],
        consent: true,
      });
    const cancelled = await book();
    const standing = await book();
    expect([cancelled.status, standing.status]).toEqual([201, 201]);
    const { reference, manageToken } = cancelled.json;
    expect((await anon.delete(`/api/bookings/${reference}?token=${manageToken}`)).status).toBe(204);

    const { page } = await phonePage();
    await page.goto(`${server.url}/b/${reference}`);
    await page.getByText('This booking is cancelled').waitFor();
    const text = await mainText(page);
    expect(text).not.toContain('Show this code at the reception desk');
    expect(text).toContain(reference);
    await page.screenshot({ path: shot('i12a-booking-code-cancelled'), fullPage: true });
    await page.getByRole('link', { name: 'See all sessions' }).waitFor();

    await page.goto(`${server.url}/b/${standing.json.reference}`);
    await page.getByText('Show this code at the reception desk').waitFor();
    await page.close();
  });
});
