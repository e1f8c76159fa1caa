import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { events, repairGroups } from '../../server/src/db/schema/index';
import { TODAY_TITLE } from '../../server/src/seed/demo-today';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let browser: Browser;
let groupId: number;
let eventId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  [{ id: groupId }] = await app.db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
  [{ id: eventId }] = await app.db.db.select().from(events).where(eq(events.title, TODAY_TITLE));
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

describe('the organiser’s section links on a phone', () => {
  for (const [name, url, nav] of [
    ['group', () => `/groups/${groupId}/settings`, 'Group'],
    ['session', () => `/events/${eventId}/manage`, 'Session'],
  ] as const)
    it(`shows every ${name} section at 390 px without scrolling sideways, each a 44 px target`, async () => {
      const { context, page } = await signedIn(browser, app.server.url, 'organiser', PHONE);
      await page.goto(app.server.url + url());
      const links = page.getByRole('navigation', { name: nav }).getByRole('link');
      await links.first().waitFor();
      await page.screenshot({ path: shot(`section-tabs-${name}-390`) });
      const boxes = await links.evaluateAll((as) => as.map((a) => a.getBoundingClientRect().toJSON()));
      expect(boxes.length).toBeGreaterThanOrEqual(7);
      for (const b of boxes) {
        expect(b.left).toBeGreaterThanOrEqual(0);
        expect(b.right).toBeLessThanOrEqual(PHONE.width);
        expect(b.height).toBeGreaterThanOrEqual(44);
      }
      const navBox = page.getByRole('navigation', { name: nav });
      expect(await navBox.evaluate((n) => n.scrollWidth <= n.clientWidth)).toBe(true);
      await context.close();
    });
});
