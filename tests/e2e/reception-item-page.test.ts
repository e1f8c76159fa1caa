import { eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { bookingItems, bookings, itemOutcomes } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

/**
 * Reception (`host`) on the item page: it may read the item, but the bench's forms (start, safety check, outcome,
 * repair photos, the salvage stock's search, take and save) are the fixers' and organisers'. The page offers reception
 * none of them, and says who does the work instead; the item's fixer still gets them. Before, reception was offered the
 * salvage search (and the safety check), and the server answered "Your role in this group does not allow this."
 */
let app: DemoApp;
let browser: Browser;
const items: Record<'kettle' | 'clothing' | 'toaster', number> = { kettle: 0, clothing: 0, toaster: 0 };
let groupId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const refs = { kettle: 'T2D-4KX', clothing: 'T3H-7PQ', toaster: 'T4M-8RS' } as const;
  const rows = await app.db.db
    .select({ id: bookingItems.id, reference: bookings.reference })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .where(inArray(bookings.reference, Object.values(refs)));
  for (const [k, ref] of Object.entries(refs))
    items[k as keyof typeof items] = rows.find((r) => r.reference === ref)!.id;
  // The toaster (mains) is at its fixer's bench, with no safety check yet; the kettle ended its life, so its parts
  // may be saved.
  await app.db.db
    .update(bookingItems)
    .set({ status: 'at-bench', startedAt: new Date() })
    .where(eq(bookingItems.id, items.toaster));
  await app.db.db.update(itemOutcomes).set({ outcome: 'end-of-life' }).where(eq(itemOutcomes.itemId, items.kettle));
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

/** What the page's content offers to fill in or press (the frame's menus left out). */
async function controlsOn(page: Page, itemId: number) {
  await page.goto(`${app.server.url}/items/${itemId}`);
  const main = page.locator('main');
  await main.getByRole('heading', { level: 1 }).waitFor();
  // The toolkit's cards load after the item: wait for the similar repairs to settle.
  await main
    .getByRole('heading', { name: /^(Similar past repairs|Eerdere reparaties van hetzelfde soort)$/ })
    .waitFor();
  await page.waitForLoadState('networkidle');
  return {
    forms: await main.locator('form').count(),
    fields: await main.locator('input, select, textarea').count(),
    buttons: (await main.getByRole('button').allTextContents()).map((b) => b.trim()),
    text: await main.innerText(),
  };
}

describe('reception on the item page', () => {
  it('is offered none of the bench’s forms, and is told who does the work (en)', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'host', PHONE);
    groupId = await page.evaluate(async () => {
      const r = await fetch('/api/auth/me');
      return ((await r.json()) as { user: { roles: { groupId: number }[] } }).user.roles[0].groupId;
    });

    // Clothing at its fixer's bench: no start, no outcome, no salvage search.
    const clothing = await controlsOn(page, items.clothing);
    expect(clothing).toMatchObject({ forms: 0, fields: 0, buttons: [] });
    expect(clothing.text).toContain('The fixer working on this item records what happened to it.');
    expect(clothing.text).not.toContain('An organiser can move it to you');

    // The toaster (mains) at the bench: the safety check is the fixer's, said in words, with no form.
    const toaster = await controlsOn(page, items.toaster);
    await page.screenshot({ path: shot('reception-item-mains-at-bench-phone'), fullPage: true });
    expect(toaster).toMatchObject({ forms: 0, fields: 0, buttons: [] });
    expect(toaster.text).toContain('The fixer working on this item does the electrical safety check.');

    // The kettle, at the end of its life: its outcome and check are read, its parts are not saved from here.
    const kettle = await controlsOn(page, items.kettle);
    expect(kettle).toMatchObject({ forms: 0, fields: 0, buttons: [] });
    expect(kettle.text).toContain('Electrical safety check');

    // What the forms would have sent is indeed refused to reception, so offering them was the fault.
    const refused = await page.evaluate(async (g) => {
      const r = await fetch(`/api/groups/${g}/salvage/substitutes?type=fuse`);
      return r.status;
    }, groupId);
    expect(refused).toBe(403);
    await context.close();
  });

  it('says the same in Dutch', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'host', PHONE, 'nl-NL');
    const toaster = await controlsOn(page, items.toaster);
    expect(toaster).toMatchObject({ forms: 0, fields: 0, buttons: [] });
    expect(toaster.text).toContain(
      'De reparateur die aan dit voorwerp werkt, doet de elektrische veiligheidscontrole.',
    );
    expect(toaster.text).toContain('De reparateur die aan dit voorwerp werkt, legt vast hoe het afliep.');
    await context.close();
  });

  it('still offers the toaster’s fixer the safety check, the outcome and the salvage search', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
    const toaster = await controlsOn(page, items.toaster);
    expect(toaster.forms).toBeGreaterThan(0);
    expect(toaster.fields).toBeGreaterThan(0);
    expect(toaster.buttons).toEqual(expect.arrayContaining(['Look in the stock', 'Record this check', 'Save outcome']));
    expect(toaster.text).not.toContain('The fixer working on this item');
    await context.close();
  });
});
