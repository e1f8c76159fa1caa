import { and, eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { bookingItems, bookings, itemAssignments } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
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

interface QueuedItem {
  itemId: number;
  status: string;
  mains: boolean;
}

/** The fixer's own queue, as the bench page reads it. */
async function myQueue(page: Page) {
  const res = await page.request.get(`${app.server.url}/api/me/queue`);
  expect(res.ok()).toBe(true);
  return (await res.json()) as QueuedItem[];
}

const waiting = (i: QueuedItem) => i.status === 'checked-in' || i.status === 'waiting';

describe('the first day at the bench on a phone', () => {
  it('shows "Start repair" and the cautions without scrolling', { timeout: 60_000 }, async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
    const queue = (await myQueue(page)).filter(waiting);
    expect(queue.length).toBeGreaterThan(0);
    // A mains item shows its cautions too; both must fit the first screen.
    const item = queue.find((i) => i.mains) ?? queue[0];
    await page.goto(`${app.server.url}/items/${item.itemId}`);
    const start = page.getByRole('button', { name: 'Start repair' });
    await start.waitFor();
    await page.screenshot({ path: shot('item-start-phone') });
    const box = await start.boundingBox();
    expect(box).not.toBeNull();
    expect(box!.y + box!.height).toBeLessThan(PHONE.height);
    if (item.mains) {
      const cautions = page.getByText('Before you open it', { exact: true });
      expect(await cautions.isVisible()).toBe(true);
      expect((await cautions.boundingBox())!.y).toBeLessThan(PHONE.height);
    }
    await context.close();
  });

  it('offers the next item and the way back to the queue once an outcome is saved', { timeout: 60_000 }, async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
    const item = (await myQueue(page)).find(waiting)!;
    // A second open item of the same session is given to the same fixer at the same bench.
    const [mine] = await app.db.db.select().from(itemAssignments).where(eq(itemAssignments.itemId, item.itemId));
    const other = (
      await app.db.db
        .select({ id: bookingItems.id })
        .from(bookingItems)
        .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
        .where(
          and(
            eq(bookings.eventId, mine.eventId),
            eq(bookings.status, 'confirmed'),
            inArray(bookingItems.status, ['booked', 'checked-in', 'waiting']),
          ),
        )
    ).find((i) => i.id !== item.itemId)!;
    await app.db.db
      .insert(itemAssignments)
      .values({ itemId: other.id, eventId: mine.eventId, userId: mine.userId, benchId: mine.benchId, source: 'hand' })
      .onDuplicateKeyUpdate({ set: { userId: mine.userId, benchId: mine.benchId } });
    // The next one is whatever stays open in the queue once this item is done, in the queue's order.
    const next = (await myQueue(page)).find((i) => i.itemId !== item.itemId)!;
    expect(next).toBeDefined();
    await page.goto(`${app.server.url}/items/${item.itemId}`);
    await page.getByRole('button', { name: 'Start repair' }).click();
    const take = page.getByRole('button', { name: 'Take it' });
    if (await take.isVisible()) await take.click();
    await page.getByRole('heading', { name: 'Record the outcome' }).waitFor();
    await page.getByRole('radiogroup', { name: 'Outcome' }).getByText('Advice given', { exact: true }).click();
    await page.getByRole('button', { name: 'Save outcome' }).click();
    await page.getByRole('heading', { name: 'Outcome: Advice given' }).waitFor();
    await page.screenshot({ path: shot('item-outcome-next-phone'), fullPage: true });

    const back = page.getByRole('link', { name: 'My queue' });
    expect(await back.getAttribute('href')).toBe('/bench');
    const nextLink = page.getByRole('link', { name: /^Next item/ });
    expect(await nextLink.getAttribute('href')).toBe(`/items/${next.itemId}`);
    await nextLink.click();
    await page.waitForURL(`**/items/${next.itemId}`);
    await page.getByRole('heading', { level: 1 }).waitFor();
    await context.close();
  });
});
