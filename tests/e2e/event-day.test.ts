import { execFileSync } from 'node:child_process';
import { existsSync, writeFileSync } from 'node:fs';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { bookingItems, bookings, events, itemOutcomes } from '../../server/src/db/schema/index';
import { TODAY_TITLE } from '../../server/src/seed/demo-today';
import { launchBrowser, PHONE, qrVideo, shot, screenshotDir, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let browser: Browser;
let eventId: number;
const TABLET = { width: 1024, height: 768 };

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const [e] = await app.db.db.select().from(events).where(eq(events.title, TODAY_TITLE));
  eventId = e.id;
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

async function itemOf(reference: string) {
  const [row] = await app.db.db
    .select({ item: bookingItems })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .where(eq(bookings.reference, reference));
  return row.item;
}

async function checkInAtDesk(page: Page, reference: string, weight?: string) {
  const search = page.getByLabel('Reference or name');
  await search.fill(reference.replace('-', '').toLowerCase());
  await search.press('Enter');
  const panel = page.getByRole('form', { name: `Check in ${reference}` });
  await panel.waitFor();
  if (weight) await panel.getByLabel('Weight in kg (if weighed)').fill(weight);
  await panel.getByRole('button', { name: 'Check in' }).click();
  const tag = page.getByTestId('issued-tag').first();
  await tag.waitFor();
  return (await tag.textContent())!.trim();
}

const passIfSafe = async (page: Page, insulation: string) => {
  for (const box of ['Cord: no cuts', 'Plug: pins', 'Strain relief', 'Casing', 'No scorch']) {
    const b = page.getByLabel(new RegExp(box));
    if (!(await b.isChecked())) await b.check();
  }
  await page.getByText('Class I', { exact: true }).click();
  await page.getByLabel('Cord length (m)').fill('2');
  await page.getByLabel('Protective conductor resistance (Ω)').fill('0.18');
  await page.getByLabel('Insulation resistance at 500 V DC (MΩ)').fill(insulation);
  await page.getByLabel('Instrument used').fill('Group appliance tester');
  await page.getByRole('button', { name: 'Record this check' }).click();
};

describe('event day in the browser', () => {
  it(
    'reception checks a visitor in by reference and prints the tags; a fixer opens the tag at phone width, fails then passes the safety check and marks it fixed; the hall display follows',
    { timeout: 120_000 },
    async () => {
      const desk = await signedIn(browser, app.server.url, 'host', TABLET);
      await desk.page.goto(`${app.server.url}/desk`);
      await desk.page.getByRole('link', { name: 'Open the desk' }).click();
      await desk.page.getByRole('heading', { name: 'Reception desk' }).waitFor();
      const code = await checkInAtDesk(desk.page, 'T6P-2XC', '3.2');
      expect(code).toMatch(/^[2-9A-HJ-NP-Z]{5}$/);
      const lamp = await itemOf('T6P-2XC');
      expect(lamp).toMatchObject({ tagCode: code, weighedKg: 3.2 });
      expect(['checked-in', 'waiting']).toContain(lamp.status);
      await desk.page.screenshot({ path: shot('desk-checked-in'), fullPage: true });

      // The tag sheet of the lamp's slot, on screen and as Chromium prints it.
      await desk.page.goto(
        `${app.server.url}/events/${eventId}/tags?slot=${(await app.db.db.select().from(bookings).where(eq(bookings.reference, 'T6P-2XC')))[0].slotId}`,
      );
      await desk.page.getByTestId('tag').first().waitFor();
      expect(await desk.page.getByTestId('tag').filter({ hasText: code }).count()).toBe(1);
      await desk.page.screenshot({ path: shot('tag-sheet-screen'), fullPage: true });
      const pdf = await desk.page.pdf({ preferCSSPageSize: true, printBackground: true });
      const pdfPath = `${screenshotDir}/tag-sheet.pdf`;
      writeFileSync(pdfPath, pdf);
      // A4 is 595.28 × 841.89 points; Chromium writes the page box it was asked for.
      const box = /\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/.exec(pdf.toString('latin1'));
      expect(Number(box![1])).toBeCloseTo(595.28, 0);
      expect(Number(box![2])).toBeCloseTo(841.89, 0);
      if (existsSync('/usr/bin/pdftoppm'))
        execFileSync('/usr/bin/pdftoppm', [
          '-png',
          '-r',
          '110',
          '-f',
          '1',
          '-l',
          '1',
          '-singlefile',
          pdfPath,
          shot('tag-sheet-printed').replace(/\.png$/, ''),
        ]);

      // The hall display, before the fixer starts.
      const hall = await browser.newPage({ viewport: { width: 1280, height: 720 } });
      await hall.goto(`${app.server.url}/events/${eventId}/hall`);
      await hall.getByTestId('waiting').waitFor();

      // The fixer scans the tag: the URL opens the item page.
      const bench = await signedIn(browser, app.server.url, 'fixer', PHONE);
      await bench.page.goto(`${app.server.url}/t/${code}`);
      await bench.page.waitForURL(new RegExp(`/items/${lamp.id}$`));
      await bench.page.getByRole('heading', { level: 1, name: /lamp/i }).waitFor();
      await bench.page.getByText('Unplug and prove dead').first().waitFor();
      await bench.page.getByRole('button', { name: 'Start repair' }).click();
      await bench.page.getByText('At the bench').first().waitFor();
      await hall.reload();
      await hall.getByTestId('serving').getByText(String(lamp.queueNumber), { exact: true }).waitFor();

      // 0.5 MΩ is below the 1.0 MΩ minimum for Class I: the check fails and "fixed" is refused.
      await passIfSafe(bench.page, '0.5');
      await bench.page
        .getByTestId('latest-check')
        .getByText(/Failed at/)
        .waitFor();
      await bench.page.getByRole('radiogroup', { name: 'Outcome' }).getByText('Fixed', { exact: true }).click();
      expect(await bench.page.getByRole('button', { name: 'Save outcome' }).isDisabled()).toBe(true);
      await bench.page.screenshot({ path: shot('item-failed-check-phone'), fullPage: true });
      await passIfSafe(bench.page, '25');
      await bench.page
        .getByTestId('latest-check')
        .getByText(/Passed at/)
        .waitFor();
      await bench.page.getByLabel('Time spent (minutes)').fill('20');
      await bench.page
        .getByLabel(/Notes for the next fixer/)
        .fill('Loose neutral at the lampholder; re-terminated and fitted a new cord grip.');
      await bench.page.getByRole('button', { name: 'Save outcome' }).click();
      await bench.page.getByRole('heading', { name: 'Outcome: Fixed' }).waitFor();
      await bench.page.screenshot({ path: shot('item-fixed-phone'), fullPage: true });
      expect((await itemOf('T6P-2XC')).status).toBe('done');

      await hall.reload();
      await hall.getByTestId('waiting').waitFor();
      expect(await hall.getByTestId('serving').getByText(String(lamp.queueNumber), { exact: true }).count()).toBe(0);
      expect(await hall.content()).not.toMatch(/Cass|Dunmore|Tobias/);
      await hall.screenshot({ path: shot('hall-display') });

      const org = await signedIn(browser, app.server.url, 'organiser', TABLET);
      await org.page.goto(`${app.server.url}/events/${eventId}/live`);
      await org.page
        .getByText(/has waited \d+ minutes/)
        .first()
        .waitFor();
      await org.page.screenshot({ path: shot('live-view'), fullPage: true });
      for (const c of [desk, bench, org]) await c.context.close();
      await hall.close();
    },
  );

  it(
    'keeps a parts-needed outcome on the phone while the network is cut and sends it when it returns',
    { timeout: 90_000 },
    async () => {
      const desk = await signedIn(browser, app.server.url, 'host', TABLET);
      await desk.page.goto(`${app.server.url}/desk/${eventId}`);
      await checkInAtDesk(desk.page, 'T7Q-3YD');
      const radio = await itemOf('T7Q-3YD');

      const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
      await page.goto(`${app.server.url}/items/${radio.id}`);
      await page.getByRole('button', { name: 'Start repair' }).click();
      // The plan may have given the radio to another fixer: taking it over asks first.
      const take = page.getByRole('button', { name: 'Take it' });
      if (await take.isVisible()) await take.click();
      await page.getByRole('heading', { name: 'Record the outcome' }).waitFor();

      await context.setOffline(true);
      await page.getByRole('radiogroup', { name: 'Outcome' }).getByText('Needs a part', { exact: true }).click();
      await page.getByLabel('Which part').fill('Smoothing capacitor 2200 µF 25 V, 105 °C');
      await page.getByLabel('Estimated cost in GBP (optional)').fill('1.80');
      await page.getByRole('button', { name: 'Save outcome' }).click();
      await page.getByTestId('pending-outcome').waitFor();
      await page.screenshot({ path: shot('item-offline-pending-phone'), fullPage: true });
      // Kept on the phone, not on the server yet.
      expect(await page.evaluate(() => localStorage.getItem('mendery.pending-writes') ?? '')).toContain(
        'Smoothing capacitor',
      );
      expect(await app.db.db.select().from(itemOutcomes).where(eq(itemOutcomes.itemId, radio.id))).toHaveLength(0);

      await context.setOffline(false);
      await page.getByRole('heading', { name: 'Outcome: Needs a part' }).waitFor();
      expect(await page.getByTestId('pending-outcome').count()).toBe(0);
      const [saved] = await app.db.db.select().from(itemOutcomes).where(eq(itemOutcomes.itemId, radio.id));
      expect(saved).toMatchObject({
        outcome: 'parts-needed',
        partDescription: 'Smoothing capacitor 2200 µF 25 V, 105 °C',
        partCostCents: 180,
      });
      await context.close();
      await desk.context.close();
    },
  );

  it(
    'reads the QR code of a confirmation mail through the device camera and opens that booking',
    { timeout: 90_000 },
    async () => {
      // Chromium's fake camera plays a video of the QR code that the confirmation mail carries (…/b/REFERENCE).
      const video = `${screenshotDir}/booking-qr.y4m`;
      qrVideo(video, `${app.server.url}/b/T5N-9WZ`);
      const camBrowser = await launchBrowser([
        '--use-fake-device-for-media-stream',
        '--use-fake-ui-for-media-stream',
        `--use-file-for-fake-video-capture=${video}`,
      ]);
      try {
        const { context, page } = await signedIn(camBrowser, app.server.url, 'host', TABLET);
        await context.grantPermissions(['camera'], { origin: app.server.url });
        await page.goto(`${app.server.url}/desk/${eventId}`);
        await page.getByRole('button', { name: 'Scan QR code' }).click();
        await page.getByRole('form', { name: 'Check in T5N-9WZ' }).waitFor({ timeout: 30_000 });
        await page.screenshot({ path: shot('desk-scanned'), fullPage: true });
      } finally {
        await camBrowser.close();
      }
    },
  );
});
