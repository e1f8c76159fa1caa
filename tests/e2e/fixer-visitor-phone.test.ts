import { and, asc, eq, inArray, like } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { bookingItems, bookings, events, itemAssignments, itemOutcomes, users } from '../../server/src/db/schema/index';
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

/** The first session of a demo series, by its title. */
async function firstEvent(title: string) {
  const [e] = await app.db.db
    .select({ id: events.id })
    .from(events)
    .where(like(events.title, title))
    .orderBy(asc(events.startsAt))
    .limit(1);
  return e.id;
}

/** One item of a session in the given status, or any item when no status is given. */
async function itemOf(eventId: number, status?: 'booked' | 'done') {
  const rows = await app.db.db
    .select({ id: bookingItems.id, status: bookingItems.status })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .where(and(eq(bookings.eventId, eventId), eq(bookings.status, 'confirmed')));
  return rows.find((r) => !status || r.status === status)!.id;
}

const dayName = (d: Date) => new Intl.DateTimeFormat('en-GB', { timeZone: 'Europe/London', weekday: 'long' }).format(d);

describe('the fixer on a phone', () => {
  it('groups "My queue" by day with the date: today first, then the coming days, past days apart', async () => {
    const [fixer] = await app.db.db.select().from(users).where(eq(users.email, 'fixer@example.org'));
    // The item waiting for this fixer at today's session.
    const [todays] = await app.db.db
      .select({ itemId: itemAssignments.itemId, benchId: itemAssignments.benchId })
      .from(itemAssignments)
      .innerJoin(bookingItems, eq(bookingItems.id, itemAssignments.itemId))
      .where(and(eq(itemAssignments.userId, fixer.id), inArray(bookingItems.status, ['checked-in', 'waiting'])));
    // One item at the next Saturday's session and one left open at a past session, both placed with this fixer.
    const next = await firstEvent('Kestlebridge repair session');
    const past = await firstEvent('Kestlebridge monthly repairs');
    const coming = await itemOf(next, 'booked');
    const old = await itemOf(past, 'done');
    await app.db.db.update(bookingItems).set({ status: 'checked-in' }).where(eq(bookingItems.id, old));
    await app.db.db.insert(itemAssignments).values([
      { itemId: coming, eventId: next, userId: fixer.id, benchId: todays.benchId, source: 'hand' },
      { itemId: old, eventId: past, userId: fixer.id, benchId: todays.benchId, source: 'hand' },
    ]);

    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
    await page.goto(`${app.server.url}/bench`);
    const queue = page.getByRole('region', { name: 'My queue' });
    await queue.getByRole('heading', { level: 3 }).first().waitFor();
    await page.screenshot({ path: shot('fixer-queue-by-day-phone'), fullPage: true });
    const headings = (await queue.getByRole('heading', { level: 3 }).allTextContents()).map((h) => h.trim());
    const now = new Date();
    expect(headings).toHaveLength(4);
    expect(headings[0]).toMatch(new RegExp(`^Today · ${dayName(now)} \\d{1,2} [A-Z][a-z]+$`));
    expect(headings[1]).toMatch(/^(Monday|Tuesday|Wednesday|Thursday|Friday|Saturday|Sunday) \d{1,2} [A-Z][a-z]+/);
    expect(headings[2]).toBe('Past sessions: items never closed');
    expect(headings[3]).toMatch(/^(Monday|Tuesday|Wednesday|Thursday|Friday|Saturday|Sunday) \d{1,2} [A-Z][a-z]+/);
    // Each item sits under its own day.
    const days = queue.getByTestId('queue-day');
    expect(await days.nth(0).getByRole('link', { name: /./ }).getAttribute('href')).toBe(`/items/${todays.itemId}`);
    expect(await days.nth(1).getByRole('link', { name: /./ }).getAttribute('href')).toBe(`/items/${coming}`);
    expect(await days.nth(2).getByRole('link', { name: /./ }).getAttribute('href')).toBe(`/items/${old}`);
    await app.db.db.delete(itemAssignments).where(eq(itemAssignments.itemId, old));
    await context.close();
  });

  it('shows the hall’s queue number alone, "due since" for a time gone by, and no queue to reception', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
    const queue = (await (await page.request.get(`${app.server.url}/api/me/queue`)).json()) as {
      itemId: number;
      slotStartsAt: string;
      queueNumber: number | null;
    }[];
    await page.goto(`${app.server.url}/bench`);
    const region = page.getByRole('region', { name: 'My queue' });
    await region.getByRole('heading', { level: 3 }).first().waitFor();
    await page.screenshot({ path: shot('fixer-bench-numbers-phone'), fullPage: true });
    const today = queue.filter((q) => new Date(q.slotStartsAt).toDateString() === new Date().toDateString());
    expect(today.length).toBeGreaterThan(0);
    for (const q of today) {
      const card = region.getByRole('listitem').filter({ has: page.locator(`a[href="/items/${q.itemId}"]`) });
      const text = (await card.textContent()) ?? '';
      // One number only, the hall's ("No. 3"): the card opens with the item, not with a count of the fixer's own.
      expect(text.trim()).toMatch(/^\D/);
      if (new Date(q.slotStartsAt) < new Date()) expect(text).toMatch(/due since \d\d:\d\d/);
      else expect(text).toMatch(/planned \d\d:\d\d/);
    }
    await context.close();

    const host = await signedIn(browser, app.server.url, 'host', PHONE);
    await host.page.goto(`${app.server.url}/bench`);
    await host.page.getByRole('heading', { name: 'My bench' }).waitFor();
    await host.page.getByRole('heading', { name: 'Sessions I can help at' }).waitFor();
    expect(await host.page.getByRole('heading', { name: 'My queue' }).count()).toBe(0);
    await host.context.close();
  });

  it('shows each repair note once on the item page, and a note written once appears once', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
    const [toaster] = await app.db.db
      .select({ id: bookingItems.id })
      .from(bookingItems)
      .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
      .where(eq(bookings.reference, 'T4M-8RS'));
    await page.goto(`${app.server.url}/items/${toaster.id}`);
    const similar = page.getByTestId('knowledge-entry');
    await similar.first().waitFor();
    // The notes of each past repair shown, as the card's "Notes" line reads.
    const texts = await similar.evaluateAll((cards) =>
      cards.map(
        (c) =>
          [...c.querySelectorAll('dt')].find((dt) => dt.textContent === 'Notes')?.nextElementSibling?.textContent ?? '',
      ),
    );
    expect(texts.filter(Boolean).length).toBeGreaterThan(1);
    expect(new Set(texts).size).toBe(texts.length);

    const note = 'Crumb guard rivet sheared; the lever catches on it. Filed it smooth.';
    await page.getByRole('button', { name: 'Start repair' }).click();
    const take = page.getByRole('button', { name: 'Take it' });
    if (await take.isVisible()) await take.click();
    await page.getByRole('heading', { name: 'Record the outcome' }).waitFor();
    await page.getByRole('radiogroup', { name: 'Outcome' }).getByText('Advice given', { exact: true }).click();
    await page.getByLabel('Notes for the next fixer (optional)').fill(note);
    await page.getByRole('button', { name: 'Save outcome' }).click();
    await page.getByRole('heading', { name: 'Outcome: Advice given' }).waitFor();
    await page.screenshot({ path: shot('fixer-note-once-phone'), fullPage: true });
    expect(await page.getByText(note).count()).toBe(1);
    const [saved] = await app.db.db.select().from(itemOutcomes).where(eq(itemOutcomes.itemId, toaster.id));
    expect(saved.notes).toBe(note);

    await page.goto(`${app.server.url}/toolkit/knowledge`);
    await page.getByLabel('Symptom or words').fill('crumb guard rivet');
    await page.getByRole('button', { name: 'Search' }).click();
    await similar.first().waitFor();
    expect(await page.getByText(note).count()).toBe(1);
    await context.close();
  });

  it('says in plain words what completing a repair note does, the same on every screen', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
    await page.goto(`${app.server.url}/toolkit/knowledge`);
    await page.getByLabel('Symptom or words').fill('steam switch');
    await page.getByRole('button', { name: 'Search' }).click();
    const entry = page.getByTestId('knowledge-entry').first();
    await entry.waitFor();
    expect(await page.getByText('Write it up').count()).toBe(0);
    await entry.getByRole('button', { name: 'Add the fix for the next fixer' }).click();
    const form = entry.getByRole('form', { name: 'The fix for the next fixer' });
    await form.getByLabel('The fix').fill('Descaled and re-seated the steam switch disc.');
    await page.screenshot({ path: shot('fixer-knowledge-fix-phone'), fullPage: true });
    await form.getByRole('button', { name: 'Save the fix' }).click();
    await entry.getByText('Fix added').waitFor();
    await entry.getByRole('button', { name: 'Edit the fix' }).waitFor();
    await context.close();
  });
});

describe('the visitor on a phone', () => {
  it('reads the session’s name, date and place before the free places and "Book a slot"', async () => {
    const eventId = await firstEvent('Kestlebridge repair session');
    const context = await browser.newContext({ viewport: PHONE });
    const page = await context.newPage();
    await page.goto(`${app.server.url}/events/${eventId}`);
    const book = page.getByRole('link', { name: 'Book a slot' });
    await book.waitFor();
    await page.screenshot({ path: shot('visitor-session-phone'), fullPage: true });
    const top = async (l: ReturnType<typeof page.getByText>) => (await l.boundingBox())!.y;
    const name = await top(page.getByRole('heading', { level: 1, name: 'Kestlebridge repair session' }));
    const date = await top(
      page.getByText(/^(Monday|Tuesday|Wednesday|Thursday|Friday|Saturday|Sunday),? \d{1,2} [A-Z][a-z]+ \d{4}/).first(),
    );
    const place = await top(page.getByText('Tanner’s Yard Hall').first());
    const free = await top(page.getByText(/places free/).first());
    const button = await top(book);
    expect(name).toBeLessThan(date);
    expect(date).toBeLessThan(place);
    expect(place).toBeLessThan(free);
    expect(free).toBeLessThan(button);
    // The three come on the first screen.
    expect(place).toBeLessThan(PHONE.height);
    await context.close();
  });

  it('offers one way back to the list of sessions, in one wording', async () => {
    const context = await browser.newContext({ viewport: PHONE });
    const page = await context.newPage();
    for (const url of ['/events/999', '/b/ZZZ-ZZZ']) {
      await page.goto(`${app.server.url}${url}`);
      await page.getByRole('link', { name: 'See all sessions' }).waitFor();
      expect(await page.getByRole('link', { name: /See the sessions|See upcoming sessions/ }).count()).toBe(0);
    }
    await context.close();
  });
});

describe('the organiser’s rota on a phone', () => {
  it('shows every seat picker of "Who is coming" within 390 px, with no hidden column', async () => {
    const eventId = await firstEvent('Kestlebridge repair session');
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', PHONE);
    await page.goto(`${app.server.url}/events/${eventId}/rota`);
    await page.getByRole('heading', { name: 'Who is coming' }).waitFor();
    const seats = page.getByRole('combobox', { name: /^Seat for / });
    await seats.first().waitFor();
    await seats.first().scrollIntoViewIfNeeded();
    await page.screenshot({ path: shot('rota-who-is-coming-phone'), fullPage: true });
    expect(await seats.count()).toBeGreaterThan(0);
    for (const box of await seats.evaluateAll((els) => els.map((e) => e.getBoundingClientRect().toJSON()))) {
      expect(box.x).toBeGreaterThanOrEqual(0);
      expect(box.x + box.width).toBeLessThanOrEqual(PHONE.width);
      expect(box.height).toBeGreaterThanOrEqual(44);
    }
    await context.close();
  });
});
