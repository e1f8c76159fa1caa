import { and, asc, eq, gt, notInArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { rebookToken } from '../../server/src/core/links';
import { events, followUps, repairGroups } from '../../server/src/db/schema/index';
import { TODAY_TITLE } from '../../server/src/seed/demo-today';
import { DESKTOP, launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';
import { Agent } from '../support/http';

/**
 * What the screenshots of every screen showed a stranger on the first day (notes: shots-findings), one check each,
 * at the width of the person who uses the screen.
 */
let app: DemoApp;
let browser: Browser;
let groupId: number;
let todayId: number;
let nextId: number;
const TABLET = { width: 820, height: 1180 };
const TV = { width: 1920, height: 1080 };

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const { db } = app.db;
  [{ id: groupId }] = await db.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
  [{ id: todayId }] = await db.select().from(events).where(eq(events.title, TODAY_TITLE));
  [{ id: nextId }] = await db
    .select()
    .from(events)
    .where(and(eq(events.groupId, groupId), eq(events.status, 'published'), gt(events.startsAt, new Date())))
    .orderBy(asc(events.startsAt))
    .limit(1);
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

async function anonymous(viewport: { width: number; height: number }) {
  const context = await browser.newContext({ viewport });
  return { context, page: await context.newPage() };
}

const lines = (page: Page, selector: string) =>
  page
    .locator(selector)
    .first()
    .evaluate((n) => {
      const lh = parseFloat(getComputedStyle(n).lineHeight);
      return Math.round(n.getBoundingClientRect().height / lh);
    });

describe('visitors and volunteers on a phone', () => {
  it('shows the demo password on one line, so nobody types half of it', async () => {
    const { context, page } = await anonymous(PHONE);
    await page.goto(`${app.server.url}/sign-in`);
    const code = page.locator('code', { hasText: 'mendery-demo' });
    await code.waitFor();
    await page.screenshot({ path: shot('shots-sign-in-phone'), fullPage: true });
    expect(await code.evaluate((n) => n.getClientRects().length)).toBe(1);
    await context.close();
  });

  it('says a cut e-mail confirmation link is incomplete, not that "fields need attention"', async () => {
    const { context, page } = await anonymous(PHONE);
    await page.goto(`${app.server.url}/verify-email?token=cut-short`);
    const alert = page.getByRole('alert').filter({ hasText: /incomplete/ });
    await alert.waitFor();
    expect(await page.getByText('Some fields need attention').count()).toBe(0);
    await context.close();
  });

  it('shows no calculator link cut off at the right edge of a phone', async () => {
    const { context, page } = await anonymous(PHONE);
    await page.goto(`${app.server.url}/toolkit/calculators`);
    await page.getByRole('button', { name: /Capacitor discharge/ }).waitFor();
    const cut = await page
      .getByRole('navigation', { name: 'Calculators' })
      .getByRole('link')
      .evaluateAll(
        (nodes, width) =>
          nodes
            .filter((n) => n.getBoundingClientRect().width > 0 && n.getBoundingClientRect().right > width)
            .map((n) => n.textContent),
        PHONE.width,
      )
      .catch(() => []);
    expect(cut).toEqual([]);
    await context.close();
  });

  it('offers the way back to the sessions when a booking link has the wrong secret', async () => {
    const { context, page } = await anonymous(PHONE);
    await page.goto(`${app.server.url}/bookings/K7M-2QD?token=not-the-right-one`);
    await page.getByText('Booking not found').waitFor();
    await page.getByRole('link', { name: 'See all sessions' }).waitFor();
    await context.close();
  });

  it('lines up the safety questions of the booking form and says whose conditions follow the house rules', async () => {
    const { context, page } = await anonymous(PHONE);
    await page.goto(`${app.server.url}/events/${nextId}/book`);
    const questions = page.getByRole('group', { name: /Safety questions/ }).getByRole('checkbox');
    await questions.first().waitFor();
    // A box squeezed by its label's wrapping is narrower and sits out of line with the others.
    const boxes = await questions.evaluateAll((nodes) =>
      nodes.map((n) => `${Math.round(n.getBoundingClientRect().left)}:${Math.round(n.getBoundingClientRect().width)}`),
    );
    expect(new Set(boxes).size, `checkbox left:width ${boxes.join(', ')}`).toBe(1);
    await page.getByRole('heading', { name: 'At every Mendery session' }).waitFor();
    await context.close();
  });

  it('says a cut password link is incomplete before asking for a new password twice', async () => {
    const { context, page } = await anonymous(PHONE);
    await page.goto(`${app.server.url}/reset-password?token=cut-short`);
    await page
      .getByRole('alert')
      .filter({ hasText: /incomplete/ })
      .waitFor();
    await page.getByRole('link', { name: 'Ask for a new link' }).waitFor();
    expect(await page.getByLabel('New password').count()).toBe(0);
    await context.close();
  });

  it("speaks of the visitor's repair, not the organisers' follow-up, when a re-booking link is closed", async () => {
    const [closed] = await app.db.db
      .select()
      .from(followUps)
      .where(notInArray(followUps.status, ['open', 'part-ordered']))
      .limit(1);
    const { context, page } = await anonymous(PHONE);
    await page.goto(`${app.server.url}/rebook/${rebookToken(app.server.ctx, closed.itemId)}`);
    await page.getByText('This repair is closed').waitFor();
    expect(await page.getByText(/follow-up/i).count()).toBe(0);
    await context.close();
  });

  it('labels the salvage buttons as actions', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
    await page.goto(`${app.server.url}/groups/${groupId}/salvage`);
    await page
      .getByRole('button', { name: /^Take one/ })
      .first()
      .waitFor();
    expect(await page.getByText('One more in the box').count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Add one .* to the box$/ }).count()).toBeGreaterThan(0);
    await context.close();
  });
});

describe('reception on a tablet', () => {
  it('gives the tag sheet its title on one line above the controls', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'host', TABLET);
    await page.goto(`${app.server.url}/events/${todayId}/tags`);
    await page.getByRole('heading', { name: /Intake tags/ }).waitFor();
    await page.screenshot({ path: shot('shots-tags-tablet') });
    expect(await lines(page, 'h1')).toBe(1);
    await context.close();
  });

  it("makes the desk's 'Print all tags' and 'Hall display' 44 px targets", async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'host', TABLET);
    await page.goto(`${app.server.url}/desk/${todayId}`);
    for (const name of ['Print all tags', 'Hall display']) {
      const box = await page.getByRole('link', { name, exact: true }).boundingBox();
      expect(box!.height, name).toBeGreaterThanOrEqual(44);
    }
    await context.close();
  });
});

describe('organisers and admins at 1280 px', () => {
  it('heads the rota and the benches like the other pages of the session', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    for (const tab of ['rota', 'benches']) {
      await page.goto(`${app.server.url}/events/${nextId}/${tab}`);
      await page.getByRole('link', { name: /Kestlebridge Menders: all sessions/ }).waitFor();
      expect(await page.locator('main').textContent(), tab).toMatch(/Saturday, \d+ \w+ \d{4}/);
    }
    const usual = page.getByRole('button', { name: 'Make this the venue’s usual layout' });
    expect(await usual.evaluate((n) => getComputedStyle(n).boxShadow)).not.toBe('none');
    await context.close();
  });

  it('shows the whole house rules and every kind of item in the group settings, with no box to scroll', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    await page.goto(`${app.server.url}/groups/${groupId}/settings`);
    const rules = page.getByLabel('House rules (one per line)');
    await rules.waitFor();
    expect(await rules.evaluate((n) => n.scrollHeight - n.clientHeight)).toBeLessThanOrEqual(1);
    const scrollers = await page
      .getByRole('group', { name: 'Categories you do not take' })
      .locator('*')
      .evaluateAll((nodes) => nodes.filter((n) => n.scrollHeight > n.clientHeight + 1).length);
    expect(scrollers).toBe(0);
    await page.screenshot({ path: shot('shots-settings'), fullPage: true });
    await context.close();
  });

  it("opens the records of the organiser's own group, not 'Not for your role'", async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    await page.goto(`${app.server.url}/impact/records`);
    await page.waitForURL(new RegExp(`groupId=${groupId}`));
    expect(await page.getByText('Not for your role').count()).toBe(0);
    await context.close();
  });

  it('shows emission factors with sensible decimals and names the e-waste column in words', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'admin', DESKTOP);
    await page.goto(`${app.server.url}/admin/categories`);
    const table = page.getByRole('table');
    await table.getByText('Kettle', { exact: true }).first().waitFor();
    const long = await table
      .getByRole('cell')
      .evaluateAll((cells) => cells.map((c) => c.firstChild?.textContent ?? '').filter((t) => /\d\.\d{4,}/.test(t)));
    expect(long).toEqual([]);
    await table.getByRole('columnheader', { name: /E-waste class/ }).waitFor();
    await context.close();
  });

  it("calls the mailbox's clear-out button what it does", async () => {
    await new Agent(app.server.url).post('/api/auth/password-reset', { email: 'fixer@example.org' });
    await app.server.ctx.outbox.drain();
    const { context, page } = await signedIn(browser, app.server.url, 'admin', DESKTOP);
    await page.goto(`${app.server.url}/admin/mailbox`);
    await page.getByText('Reset your Mendery password').first().waitFor();
    expect(await page.getByRole('button', { name: 'Empty', exact: true }).count()).toBe(0);
    await page.getByRole('button', { name: 'Delete all mail' }).waitFor();
    await context.close();
  });
});

describe('the hall display on a TV', () => {
  it('tells the first number in the queue that it is next', async () => {
    const { context, page } = await anonymous(TV);
    await page.goto(`${app.server.url}/events/${todayId}/hall`);
    const waiting = page.getByTestId('waiting');
    await waiting.waitFor();
    expect(await waiting.textContent()).not.toMatch(/any moment/);
    await waiting.getByText('up next').first().waitFor();
    await context.close();
  });
});
