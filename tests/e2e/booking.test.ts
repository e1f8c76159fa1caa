import { writeFileSync } from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../../shared/constants';
import type { RunningServer } from '../../server/src/server';
import { DESKTOP, launchBrowser, PHONE, shot } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let server: RunningServer;
let browser: Browser;
let photo: string;

beforeAll(async () => {
  app = await startDemoApp();
  server = app.server;
  browser = await launchBrowser();
  photo = path.join(app.dataDir, 'kettle-label.jpg');
  writeFileSync(
    photo,
    await sharp({ create: { width: 1200, height: 900, channels: 3, background: '#c9b79c' } })
      .jpeg()
      .toBuffer(),
  );
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

async function firstEvent(page: Page) {
  await page.goto(`${server.url}/events`);
  await page
    .getByRole('link', { name: /Kestlebridge repair session/ })
    .first()
    .click();
  await page.getByRole('heading', { level: 1, name: 'Kestlebridge repair session' }).waitFor();
}

describe('finding a session and booking a slot', () => {
  it('shows the sessions as a list and as a calendar, and an event page', async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await page.goto(`${server.url}/events`);
    await page.getByRole('link', { name: /Orrin Vale mending afternoon/ }).waitFor();
    await page.screenshot({ path: shot('events-list'), fullPage: true });
    await page.getByRole('button', { name: 'Calendar' }).click();
    await page.locator('.fc-daygrid-event').first().waitFor();
    await page.screenshot({ path: shot('events-calendar'), fullPage: true });
    await firstEvent(page);
    await page.getByRole('heading', { name: 'What we do not take' }).waitFor();
    expect(await page.getByText('Microwave oven').count()).toBeGreaterThan(0);
    await page.screenshot({ path: shot('event-page'), fullPage: true });
    await page.getByRole('link', { name: 'Book a slot' }).click();
    await page.getByRole('heading', { name: 'Book a repair slot' }).waitFor();
    await page.screenshot({ path: shot('booking-form-desktop'), fullPage: true });
    await page.close();
  });

  it('refuses an excluded category in the form, with the reason', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await firstEvent(page);
    await page.getByRole('link', { name: 'Book a slot' }).click();
    await page.getByLabel('What is it?').selectOption({ label: 'Microwave oven (not taken)' });
    await page.getByText('high-voltage capacitor').waitFor();
    await page.close();
  });

  it('books at phone width with a photo, mails the confirmation, and the manage link cancels', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await firstEvent(page);
    await page.getByRole('link', { name: 'Book a slot' }).click();
    await page.getByRole('heading', { name: 'Book a repair slot' }).waitFor();
    // Sending the empty form shows what is missing and books nothing.
    await page.getByRole('button', { name: 'Book my slot' }).click();
    await page.getByText('Enter your name.').waitFor();
    await page.screenshot({ path: shot('booking-form-phone-errors'), fullPage: true });

    await page.locator('label', { hasText: 'free' }).nth(1).click();
    await page.getByLabel('Your name').fill('Tamsin Greave');
    await page.getByLabel('E-mail').fill('tamsin@example.org');
    await page.getByLabel('What is it?').selectOption({ label: 'Kettle' });
    await page.getByLabel('Brand (optional)').fill('Brewmaster');
    await page.getByLabel('What is wrong with it?').fill('Clicks off after a few seconds, before the water is hot.');
    await page.getByLabel('Photos (optional, up to 3)').setInputFiles(photo);
    await page.getByLabel(/I accept the house rules/).check();
    await page.screenshot({ path: shot('booking-form-phone'), fullPage: true });
    await page.getByRole('button', { name: 'Book my slot' }).click();
    await page.getByText('You are booked').waitFor({ timeout: 15_000 });
    const reference = (await page.locator('.font-mono').first().textContent())!.trim();
    expect(reference).toMatch(/^[2-9A-HJ-NP-Z]{3}-[2-9A-HJ-NP-Z]{3}$/);
    await page.locator('img[src^="/api/photos/"]').first().waitFor();
    await page.screenshot({ path: shot('booking-confirmation-phone'), fullPage: true });
    await page.close();

    // The confirmation mail, as caught by the local mailbox and read by an admin.
    const admin = await browser.newPage({ viewport: DESKTOP });
    await admin.goto(`${server.url}/sign-in`);
    await admin.getByLabel('E-mail').fill('admin@example.org');
    await admin.getByLabel('Password').fill(DEMO_PASSWORD);
    await admin.getByRole('button', { name: 'Sign in', exact: true }).click();
    await admin.waitForURL(/\/admin$/);
    await admin.goto(`${server.url}/admin/mailbox`);
    await admin.getByText(`Booked: Kestlebridge repair session — ${reference}`).click({ timeout: 15_000 });
    await admin.frameLocator('iframe[title="Rendered mail"]').getByAltText(`Booking ${reference}`).waitFor();
    await admin.screenshot({ path: shot('booking-mail'), fullPage: true });
    await admin.getByRole('tab', { name: 'Plain text' }).click();
    const link = /http\S+\/bookings\/\S+#token=\S+/.exec((await admin.locator('pre').textContent()) ?? '')![0];
    await admin.close();

    const visitor = await browser.newPage({ viewport: PHONE });
    await visitor.goto(link);
    await visitor.getByText(reference).first().waitFor();
    await visitor.getByRole('button', { name: 'Cancel my booking' }).click();
    await visitor.getByRole('button', { name: 'Cancel the booking' }).click();
    await visitor.getByText('This booking is cancelled').waitFor();
    await visitor.screenshot({ path: shot('booking-cancelled-phone'), fullPage: true });
    await visitor.close();
  });

  it('lets the organiser see what is coming and create a draft session', { timeout: 60_000 }, async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await page.goto(`${server.url}/sign-in`);
    await page.getByLabel('E-mail').fill('organiser@example.org');
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.waitForURL(/\/groups\/\d+\/events$/);
    await page.screenshot({ path: shot('organiser-sessions'), fullPage: true });
    await page
      .getByRole('link', { name: /Kestlebridge repair session/ })
      .first()
      .click();
    await page.getByRole('heading', { name: 'What is coming' }).waitFor();
    await page.getByText('Orla Whitcombe').waitFor();
    await page.screenshot({ path: shot('organiser-event'), fullPage: true });
    await page.getByRole('link', { name: /all sessions/ }).click();
    await page.getByRole('link', { name: '+ New session' }).click();
    await page.getByLabel('Venue').selectOption({ index: 1 });
    const d = new Date(Date.now() + 90 * 86400_000).toISOString().slice(0, 10);
    await page.getByLabel('Date').fill(d);
    await page.getByText('6 slots of 30 minutes, 24 places in all.').waitFor();
    await page.screenshot({ path: shot('organiser-new-event'), fullPage: true });
    await page.getByRole('button', { name: 'Create the draft' }).click();
    await page.getByRole('button', { name: 'Publish' }).waitFor();
    expect(await page.locator('tbody tr').count()).toBe(6);
    await page.close();
  });
});
