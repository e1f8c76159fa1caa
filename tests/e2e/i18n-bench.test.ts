import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { bookingItems, bookings } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

/**
 * The rest of the fixer's item page and the fixer's queue, in the fixer's language: the safety check (its verdict
 * with the language's decimal comma), the outcome form and its messages, the photos, and "My bench". The limits are
 * the ones in shared/safety (insulation at least 0.3 MΩ for a class I appliance with heating elements: common
 * trade practice for in-service inspection and testing).
 */
let app: DemoApp;
let browser: Browser;
let kettleItem: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const [row] = await app.db.db
    .select({ id: bookingItems.id })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .where(eq(bookings.reference, 'T2D-4KX'));
  kettleItem = row.id;
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const widthOf = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth);

describe('the fixer’s forms and queue in four languages', () => {
  it('judges a safety check in German, with a decimal comma and the class named', { timeout: 60_000 }, async () => {
    // Back at the bench, the kettle may be checked again (a done item keeps its last check).
    await app.db.db.update(bookingItems).set({ status: 'at-bench' }).where(eq(bookingItems.id, kettleItem));
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE, 'de-DE');
    await page.goto(`${app.server.url}/items/${kettleItem}`);
    await page.getByRole('button', { name: 'Weitere Prüfung erfassen' }).click();
    await page.getByText('Sichtprüfung', { exact: true }).waitFor();
    await page.getByLabel('Isolationswiderstand bei 500 V DC (MΩ)').fill('0,2');
    const verdict = page.getByTestId('verdict');
    await expect
      .poll(() => verdict.innerText())
      .toContain('Isolation 0,2 MΩ liegt unter dem Mindestwert von 0,3 MΩ für Klasse I mit Heizelementen.');
    // A reading that is not a number is refused in German.
    await page.getByLabel('Kabellänge (m)').fill('zwei');
    await page.getByText('Geben Sie eine Zahl ein, z. B. 0,12.').first().waitFor();
    expect(await page.locator('main').innerText()).not.toMatch(/Visual inspection|Appliance class|These readings/);
    expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
    await page.screenshot({ path: shot('i18n-safety-de'), fullPage: true });
    await context.close();
    await app.db.db.update(bookingItems).set({ status: 'done' }).where(eq(bookingItems.id, kettleItem));
  });

  it(
    'reads a failed check recorded in English in French, its figures worked out again from the readings',
    {
      timeout: 60_000,
    },
    async () => {
      await app.db.db.update(bookingItems).set({ status: 'at-bench' }).where(eq(bookingItems.id, kettleItem));
      const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
      await page.goto(`${app.server.url}/items/${kettleItem}?lang=en`);
      await page.getByRole('button', { name: 'Record another check' }).click();
      for (const box of ['Cord: no cuts', 'Plug: pins', 'Strain relief', 'Casing', 'No scorch'])
        await page.getByLabel(new RegExp(box)).check();
      await page.getByText('Class I', { exact: true }).click();
      await page.getByLabel('Heating elements', { exact: false }).first().check();
      await page.getByLabel('Cord length (m)').fill('2');
      await page.getByLabel('Protective conductor resistance (Ω)').fill('0.18');
      await page.getByLabel('Insulation resistance at 500 V DC (MΩ)').fill('0.2');
      await page.getByRole('button', { name: 'Record this check' }).click();
      await page
        .getByTestId('latest-check')
        .getByText(/Failed at/)
        .waitFor();
      await page.goto(`${app.server.url}/items/${kettleItem}?lang=fr`);
      const latest = page.getByTestId('latest-check');
      await latest.getByText(/Échoué à/).waitFor();
      // locales/fr/bench.json, with the French decimal comma (CLDR fr).
      expect(await latest.innerText()).toContain(
        'Isolement 0,2 MΩ en dessous du minimum de 0,3 MΩ pour la classe I avec éléments chauffants.',
      );
      expect(await latest.innerText()).not.toContain('Insulation');
      await context.close();
      await app.db.db.update(bookingItems).set({ status: 'done' }).where(eq(bookingItems.id, kettleItem));
    },
  );

  it('asks why an item cannot be mended in Dutch, with the reason’s hint', { timeout: 60_000 }, async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE, 'nl-NL');
    await page.goto(`${app.server.url}/items/${kettleItem}`);
    await page.getByRole('button', { name: 'Resultaat corrigeren' }).click();
    const outcome = page.getByRole('radiogroup', { name: 'Resultaat' });
    await outcome.getByText('Niet meer te maken').click();
    await page.getByText('Waarom kan het niet gemaakt worden?').waitFor();
    await page.getByText('Dichtgelijmd of -gelast, of het zou breken bij het openen.').waitFor();
    await page.getByRole('button', { name: 'Resultaat opslaan' }).click();
    await page.getByText('Kies waarom het niet gemaakt kan worden.').waitFor();
    expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
    await page.screenshot({ path: shot('i18n-outcome-nl'), fullPage: true });
    await context.close();
  });

  it('shows the queue page in French, and fits the pseudo-locale at 390 px', { timeout: 60_000 }, async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE, 'fr-FR');
    await page.goto(`${app.server.url}/bench`);
    await page.getByRole('heading', { name: 'Mon établi', level: 1 }).waitFor();
    await page.getByRole('heading', { name: 'Ma file' }).waitFor();
    expect(await page.locator('main').innerText()).not.toMatch(/My queue|Repair notes|Brand not given/);
    await page.screenshot({ path: shot('i18n-bench-fr'), fullPage: true });
    for (const path of ['/bench', `/items/${kettleItem}`]) {
      await page.goto(`${app.server.url}${path}?lang=xx-pseudo`);
      await page.getByRole('heading', { level: 1 }).waitFor();
      // The page's own words carry the accents (the kind of item is the API's, in English for the pseudo-locale).
      await expect.poll(() => page.locator('main').innerText()).toMatch(/[àéïöüçñý]{1}\S*[àéïöüçñý]/);
      expect(await widthOf(page), path).toBeLessThanOrEqual(PHONE.width);
    }
    await context.close();
  });
});
