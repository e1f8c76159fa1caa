import { readFileSync } from 'node:fs';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { bookings, categories, repairGroups } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';
import { Agent } from '../support/http';

/** Issue 14, personal data, on a phone: the visitor's copy and erasure, the privacy page, the organiser's side. */
let app: DemoApp;
let browser: Browser;
let groupId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const [g] = await app.db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
  groupId = g.id;
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

/** A booking made through the API on the group's next session with room. */
async function book(name: string) {
  const a = new Agent(app.server.url);
  const list = (await a.get('/api/events')).json as { id: number; groupId: number; startsAt: string }[];
  const [kettle] = await app.db.db.select().from(categories).where(eq(categories.slug, 'kettle'));
  for (const e of list.filter((x) => x.groupId === groupId)) {
    const detail = (await a.get(`/api/events/${e.id}`)).json;
    const slot = detail.slots?.find(
      (s: { free: number; startsAt: string }) => s.free > 0 && new Date(s.startsAt) > new Date(),
    );
    if (!slot) continue;
    const email = `${name.toLowerCase().replace(/\W+/g, '.')}@example.net`;
    const r = await a.post('/api/bookings', {
      slotId: slot.id,
      visitor: { name, email, phone: '07700 900456' },
      items: [{ categoryId: kettle.id, fault: `Lid hinge snapped. ${name}, 07700 900456.` }],
      consent: true,
    });
    expect(r.status, r.text).toBe(201);
    return { reference: r.json.reference as string, token: r.json.manageToken as string, name, email };
  }
  throw new Error('no session with room');
}

describe('personal data at phone width', () => {
  it('the visitor downloads a copy of their details, then erases them from the manage page', async () => {
    const b = await book('Perpetua Linwood');
    const page = await browser.newPage({ viewport: PHONE, acceptDownloads: true });
    await page.goto(`${app.server.url}/bookings/${b.reference}?token=${encodeURIComponent(b.token)}`);
    await page.getByRole('heading', { name: 'Your details' }).waitFor();
    await page.screenshot({ path: shot('booking-your-details-phone'), fullPage: true });
    const download = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Download my details' }).click();
    const copy = JSON.parse(readFileSync((await (await download).path())!, 'utf8'));
    expect(copy.you).toMatchObject({ name: b.name, email: b.email, phone: '07700 900456' });

    await page.getByRole('button', { name: 'Erase my details' }).click();
    const dialog = page.getByRole('dialog', { name: 'Erase your details?' });
    await dialog.waitFor();
    // The safe answer has the focus: Enter keeps everything.
    expect(await dialog.getByRole('button', { name: 'Keep' }).evaluate((el) => el === document.activeElement)).toBe(
      true,
    );
    await page.screenshot({ path: shot('booking-erase-confirm-phone') });
    await dialog.getByRole('button', { name: 'Erase my details' }).click();
    await page.getByText('Your details are erased').waitFor();
    await page.screenshot({ path: shot('booking-erased-phone'), fullPage: true });
    const [row] = await app.db.db.select().from(bookings).where(eq(bookings.reference, b.reference));
    expect(row).toMatchObject({ visitorName: 'Erased', visitorEmail: null, visitorPhone: null });
    await page.close();
  });

  it('the booking form links to the group privacy page, written from its settings', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    const list = (await new Agent(app.server.url).get('/api/events')).json as { id: number; groupId: number }[];
    const e = list.find((x) => x.groupId === groupId)!;
    await page.goto(`${app.server.url}/events/${e.id}/book`);
    await page.getByRole('link', { name: /looks after your details/ }).click();
    await page.getByRole('heading', { level: 1, name: /Your details at Kestlebridge/ }).waitFor();
    await page.getByText('12 months after your session').waitFor();
    const width = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(width).toBeLessThanOrEqual(390);
    await page.screenshot({ path: shot('group-privacy-phone'), fullPage: true });
    await page.close();
  });

  it('the organiser sets the period and contact, sees the last run, and erases a booking on request', async () => {
    const b = await book('Ottoline Farrant');
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', PHONE);
    await page.goto(`${app.server.url}/groups/${groupId}/settings`);
    await page.getByRole('heading', { name: "Visitors' details" }).waitFor();
    await page.getByText('The clean-up has not run yet').waitFor();
    await page.getByLabel(/Keep visitors' details for/).fill('0');
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await page.getByText('Keep details for 1 to 120 months.').waitFor();
    await page.getByLabel(/Keep visitors' details for/).fill('18');
    await page.getByLabel('Contact for questions about their details').fill('privacy@kestlebridge.example.org');
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await page.getByText('Saved.').last().waitFor();
    await page.getByRole('heading', { name: "Visitors' details" }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: shot('group-settings-retention-phone'), fullPage: true });
    const notice = (await new Agent(app.server.url).get(`/api/public/groups/${groupId}/privacy`)).json;
    expect(JSON.stringify(notice)).toContain('18 months');

    const [row] = await app.db.db.select().from(bookings).where(eq(bookings.reference, b.reference));
    await page.goto(`${app.server.url}/events/${row.eventId}/manage`);
    await page.getByRole('button', { name: `Erase the details of ${b.name} (${b.reference})` }).click();
    const dialog = page.getByRole('dialog', { name: `Erase the details of ${b.name}?` });
    await dialog.waitFor();
    await page.screenshot({ path: shot('organiser-erase-confirm-phone') });
    await dialog.getByRole('button', { name: 'Erase the details' }).click();
    await page.getByText(b.reference).first().waitFor();
    await expect.poll(async () => page.getByText(b.name).count()).toBe(0);
    await context.close();
  });

  it('a volunteer downloads their account and closes it', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
    await page.goto(`${app.server.url}/me/data`);
    await page.getByRole('heading', { name: 'Your account' }).waitFor();
    await page.screenshot({ path: shot('my-data-phone'), fullPage: true });
    await page.getByRole('button', { name: 'Close my account' }).click();
    await page
      .getByRole('dialog', { name: 'Close your account?' })
      .getByRole('button', { name: 'Close my account' })
      .click();
    await page.waitForURL((u) => u.pathname === '/');
    const me = await page.evaluate(() => fetch('/api/auth/me').then((r) => r.json()));
    expect(me.user).toBeNull();
    await context.close();
  });
});
