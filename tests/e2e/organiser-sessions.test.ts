import { and, asc, eq, isNotNull, like } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { bookings, events } from '../../server/src/db/schema/index';
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
