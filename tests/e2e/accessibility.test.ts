import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { demoScreens, ROLES, seriousViolations, settled, type Role, type Screen } from '../support/accessibility';
import { DESKTOP, launchBrowser, PHONE, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

/*
 * WCAG 2.2 AA (issue 12): every screen, for every role that can open it, at 390 px and 1280 px, has no serious or
 * critical axe-core violation. One browser, one context per role, one server.
 */

let app: DemoApp;
let browser: Browser;
let screens: Screen[];
const pages = new Map<Role, { context: BrowserContext; page: Page }>();

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  screens = await demoScreens(app);
  for (const role of ROLES) {
    if (role === 'anonymous') {
      const context = await browser.newContext({ viewport: PHONE });
      pages.set(role, { context, page: await context.newPage() });
    } else pages.set(role, await signedIn(browser, app.server.url, role, PHONE));
  }
  // A re-booking link for an item waiting for a part, as the follow-up list gives it to the organiser.
  const organiser = pages.get('organiser')!.page;
  const group = screens.find((s) => s.name === 'follow-ups')!.path.split('/')[2];
  const followUps = await (await organiser.request.get(`${app.server.url}/api/groups/${group}/follow-ups`)).json();
  const open = (followUps as { status: string; rebookUrl: string }[]).find((f) => f.status === 'open');
  if (open) screens.push({ name: 'rebook', path: new URL(open.rebookUrl).pathname, roles: ['anonymous'] });
  // A caught mail opened in the admin's mailbox.
  const admin = pages.get('admin')!.page;
  const mails = (await (await admin.request.get(`${app.server.url}/api/admin/mailbox`)).json()) as { id: number }[];
  if (mails.length) screens.push({ name: 'mail', path: `/admin/mailbox/${mails[0].id}`, roles: ['admin'] });
}, 120_000);
afterAll(async () => {
  for (const { context } of pages.values()) await context.close();
  await browser?.close();
  await app?.stop();
});

/** Opens each screen once and checks it at both widths, resizing in between rather than loading it twice. */
async function checkAll(role: Role) {
  const { page } = pages.get(role)!;
  const found: string[] = [];
  let widths = [PHONE, DESKTOP];
  for (const screen of screens.filter((s) => s.roles.includes(role))) {
    await page.setViewportSize(widths[0]);
    await page.goto(`${app.server.url}${screen.path}`);
    try {
      await settled(page);
    } catch {
      found.push(`${screen.path} (${screen.name}) as ${role}: never showed its data`);
      continue;
    }
    for (const [n, width] of widths.entries()) {
      if (n > 0) await page.setViewportSize(width);
      found.push(...(await seriousViolations(page, `${screen.path} (${screen.name}) as ${role} at ${width.width} px`)));
    }
    widths = widths.reverse();
  }
  return found;
}

describe('accessibility of every screen (axe-core, WCAG 2.2 A and AA)', () => {
  for (const role of ROLES)
    it(
      `has no serious or critical violation on any screen ${role === 'anonymous' ? 'a visitor' : `the ${role}`} can open, at 390 and 1280 px`,
      { timeout: 600_000 }, // a busy 2-core machine runs the admin's screens in 80–300 s
      async () => {
        expect(await checkAll(role)).toEqual([]);
      },
    );

  it('has none in the open phone menu nor in a confirmation dialog', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', PHONE);
    await page.goto(`${app.server.url}/events`);
    await settled(page);
    await page.getByRole('button', { name: 'Menu' }).click();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sessions' }).waitFor();
    const found = await seriousViolations(page, '/events phone menu as organiser at 390 px');
    await page.keyboard.press('Escape');

    const salvage = screens.find((s) => s.name === 'salvage')!.path;
    await page.goto(`${app.server.url}${salvage}`);
    await settled(page);
    await page
      .getByRole('button', { name: /^Remove / })
      .first()
      .click();
    await page.getByRole('dialog').waitFor();
    found.push(...(await seriousViolations(page, `${salvage} "Remove this part" dialog as organiser at 390 px`)));
    await context.close();
    expect(found).toEqual([]);
  });
});
