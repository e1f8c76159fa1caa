import { and, asc, desc, eq, isNotNull, like, lt, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { bookings, events, impactCells, memberships, repairGroups, users } from '../../server/src/db/schema/index';
import { TODAY_TITLE } from '../../server/src/seed/demo-today';
import { makeGroup } from '../support/factories';
import { DESKTOP, launchBrowser, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let browser: Browser;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const statusOf = async (id: number) =>
  (await app.db.db.select({ s: events.status }).from(events).where(eq(events.id, id)))[0].s;

describe('the organiser at 1280 px: the group’s sessions', () => {
  it('lists today and the coming sessions first, and the past ones apart with what came of them', async () => {
    const [g] = await app.db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    await page.goto(`${app.server.url}/groups/${g.id}/events`);
    const coming = page.getByRole('region', { name: 'Today and coming up' });
    const past = page.getByRole('region', { name: /^Past sessions/ });
    await coming.getByRole('listitem').first().waitFor();
    await past
      .getByText(/items? seen/)
      .first()
      .waitFor();
    await page.screenshot({ path: shot('group-sessions-desktop'), fullPage: true });

    // Today's session leads and is marked; then the rest, soonest first; nothing that is over.
    const upcoming = await app.db.db
      .select({ title: events.title, startsAt: events.startsAt })
      .from(events)
      .where(and(eq(events.groupId, g.id), sql`${events.startsAt} > NOW()`))
      .orderBy(asc(events.startsAt));
    const comingRows = coming.getByRole('listitem');
    expect(await comingRows.count()).toBe(upcoming.length + 1);
    await expect(comingRows.first().textContent()).resolves.toMatch(new RegExp(`^Today.*${TODAY_TITLE}`));
    const titles = (await comingRows.allTextContents()).slice(1);
    titles.forEach((t, i) => expect(t).toContain(upcoming[i].title));
    expect(await coming.getByText('Today', { exact: true }).count()).toBe(1);

    // Past: most recent first, with its figures from the statistics rollup, and no places free.
    const [last] = await app.db.db
      .select({ id: events.id })
      .from(events)
      .where(and(eq(events.groupId, g.id), lt(events.endsAt, sql`CURDATE()`)))
      .orderBy(desc(events.startsAt))
      .limit(1);
    const [cells] = await app.db.db
      .select({ items: sql<string>`SUM(${impactCells.items})`, fixed: sql<string>`SUM(${impactCells.fixed})` })
      .from(impactCells)
      .where(eq(impactCells.eventId, last.id));
    const firstPast = past.getByRole('listitem').first();
    const text = await firstPast.textContent();
    expect(text).toContain(`${Number(cells.items)} items seen`);
    expect(text).toContain(`${Number(cells.fixed)} fixed`);
    expect(text).toMatch(/[\d.]+ kg kept out of the bin/);
    expect(await past.getByText(/places free|Fully booked/).count()).toBe(0);
    await expect(firstPast.getByRole('link', { name: /^Report/ }).getAttribute('href')).resolves.toBe(
      `/events/${last.id}/report`,
    );

    // Paged: six at first, then more on request.
    expect(await past.getByRole('listitem').count()).toBe(6);
    await past.getByRole('button', { name: /^Show \d+ earlier sessions$/ }).click();
    expect(await past.getByRole('listitem').count()).toBeGreaterThan(6);
    await context.close();
  });

  it('says so when a group has no sessions in either list', async () => {
    const groupId = await makeGroup(app.db.db, 'Newcombe Fixers');
    const [me] = await app.db.db.select().from(users).where(eq(users.email, 'organiser@example.org'));
    await app.db.db.insert(memberships).values({ userId: me.id, groupId, role: 'organiser', status: 'active' });
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    await page.goto(`${app.server.url}/groups/${groupId}/events`);
    await page.getByRole('region', { name: 'Today and coming up' }).getByText('Nothing planned yet').waitFor();
    await page
      .getByRole('region', { name: /^Past sessions/ })
      .getByText('No past sessions yet')
      .waitFor();
    await context.close();
  });
});

describe('the organiser at 1280 px: cancelling a session', () => {
  it('keeps “Cancel session” apart from “Close booking” and asks first, naming the session and the bookings to tell', async () => {
    // The next Kestlebridge session, the one with bookings in the demo.
    const [event] = await app.db.db
      .select({ id: events.id, title: events.title })
      .from(events)
      .where(and(like(events.title, 'Kestlebridge repair session%'), eq(events.status, 'published')))
      .orderBy(asc(events.startsAt))
      .limit(1);
    const told = (
      await app.db.db
        .select({ id: bookings.id })
        .from(bookings)
        .where(and(eq(bookings.eventId, event.id), eq(bookings.status, 'confirmed'), isNotNull(bookings.visitorEmail)))
    ).length;
    expect(told).toBeGreaterThan(1);

    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    await page.goto(`${app.server.url}/events/${event.id}/manage`);
    await page.getByRole('button', { name: 'Close booking' }).waitFor();

    // Apart: in its own section, not beside the everyday buttons.
    const zone = page.getByRole('region', { name: 'Calling the session off' });
    await expect(zone.getByRole('button', { name: 'Cancel session' }).count()).resolves.toBe(1);
    await expect(zone.getByRole('button', { name: 'Close booking' }).count()).resolves.toBe(0);
    const closeBox = (await page.getByRole('button', { name: 'Close booking' }).boundingBox())!;
    const cancelBox = (await page.getByRole('button', { name: 'Cancel session' }).boundingBox())!;
    expect(cancelBox.y - closeBox.y).toBeGreaterThan(200);
    await page.screenshot({ path: shot('manage-session-desktop'), fullPage: true });

    // Escape leaves everything as it was.
    await page.getByRole('button', { name: 'Cancel session' }).click();
    const dialog = page.getByRole('dialog', { name: `Cancel “${event.title}”?` });
    await dialog.waitFor();
    await expect(dialog.textContent()).resolves.toContain(`${told} bookings will be told by e-mail`);
    await page.screenshot({ path: shot('cancel-session-dialog-desktop') });
    await page.keyboard.press('Escape');
    await dialog.waitFor({ state: 'hidden' });
    expect(await statusOf(event.id)).toBe('published');

    // So does "Keep the session", reached by keyboard: the first focus is on it.
    await page.getByRole('button', { name: 'Cancel session' }).click();
    await dialog.waitFor();
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Keep the session');
    await page.keyboard.press('Enter');
    await dialog.waitFor({ state: 'hidden' });
    expect(await statusOf(event.id)).toBe('published');

    // Confirming cancels.
    await page.getByRole('button', { name: 'Cancel session' }).click();
    await dialog.getByRole('button', { name: 'Yes, cancel the session' }).click();
    await page.getByText('Cancelled', { exact: true }).first().waitFor();
    expect(await statusOf(event.id)).toBe('cancelled');
    expect(await page.getByRole('button', { name: 'Cancel session' }).count()).toBe(0);
    await context.close();
  });
});

describe('the organiser at 1280 px: the group’s currency', () => {
  it('sets the currency on the settings page and shows part costs in it', async () => {
    const [g] = await app.db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    await page.goto(`${app.server.url}/groups/${g.id}/follow-ups`);
    await page
      .getByText(/about £\d+\.\d\d/)
      .first()
      .waitFor();

    await page.goto(`${app.server.url}/groups/${g.id}/settings`);
    await page.getByLabel('Currency of part costs').selectOption('EUR');
    await page.getByLabel('Country').selectOption({ label: 'Ireland' });
    await page.getByRole('button', { name: 'Save country and currency' }).click();
    await page.getByText('Saved.').waitFor();
    await page.screenshot({ path: shot('group-settings-currency-desktop'), fullPage: true });
    const [saved] = await app.db.db.select().from(repairGroups).where(eq(repairGroups.id, g.id));
    expect([saved.currency, saved.country]).toEqual(['EUR', 'IRL']);

    await page.goto(`${app.server.url}/groups/${g.id}/follow-ups`);
    // en-GB writes euros as €12.50 (ECMA-402 Intl.NumberFormat with CLDR data).
    await page
      .getByText(/about €\d+\.\d\d/)
      .first()
      .waitFor();
    expect(await page.getByText(/about £\d/).count()).toBe(0);
    await context.close();
  });
});
