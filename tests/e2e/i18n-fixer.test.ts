import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { bookingItems, bookings, users } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

/**
 * The fixer's item page in the fixer's language: the demo's kettle (mains, a heating element, done with its safety
 * check) shows the cautions, the outcome and the check. The words are the catalogs'; what a caution says is common
 * trade practice (e.g. about 300 V DC left on a switch-mode supply's main capacitor).
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
    .where(and(eq(bookings.reference, 'T2D-4KX')));
  kettleItem = row.id;
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const widthOf = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth);

const expected = {
  en: { cautions: 'Before you open it', capacitor: 'Capacitors stay charged', status: 'Done', kind: 'Kettle' },
  nl: {
    cautions: 'Voordat je het openmaakt',
    capacitor: 'Condensatoren blijven geladen',
    status: 'Klaar',
    kind: 'Waterkoker',
  },
  de: {
    cautions: 'Bevor Sie es öffnen',
    capacitor: 'Kondensatoren bleiben geladen',
    status: 'Fertig',
    kind: 'Wasserkocher',
  },
  fr: {
    cautions: 'Avant de l’ouvrir',
    capacitor: 'Les condensateurs restent chargés',
    status: 'Terminé',
    kind: 'Bouilloire',
  },
};

describe('the fixer’s item page in four languages', () => {
  it('shows the cautions, the state and the kind of item in the browser’s language, within 390 px', async () => {
    for (const [lang, words] of Object.entries(expected)) {
      const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE, lang);
      await page.goto(`${app.server.url}/items/${kettleItem}`);
      await page.getByRole('heading', { level: 1, name: new RegExp(words.kind) }).waitFor();
      expect(await page.getAttribute('html', 'lang')).toBe(lang);
      await page.getByText(words.cautions).first().waitFor();
      await page.getByText(words.capacitor).first().waitFor();
      await page.getByText(words.status, { exact: true }).first().waitFor();
      if (lang !== 'en') expect(await page.getByText('Before you open it').count()).toBe(0);
      expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
      await page.screenshot({ path: shot(`i18n-item-${lang}`), fullPage: true });
      await context.close();
    }
  });

  it('fits the pseudo-locale (longer, accented) at 390 px', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'fixer', PHONE);
    await page.goto(`${app.server.url}/items/${kettleItem}?lang=xx-pseudo`);
    await page.getByRole('heading', { level: 1 }).waitFor();
    await page
      .getByText(/B[ÉéEe]+f[öo]+r[ée]+ [ýy][öo]+[üu]+ [öo]+p[ée]+[ñn] [ïi]+t/)
      .first()
      .waitFor();
    expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
    await page.screenshot({ path: shot('i18n-item-pseudo'), fullPage: true });
    await context.close();
  });

  it('opens in the account’s language after sign-in, and keeps a new choice on the account', async () => {
    await app.db.db.update(users).set({ language: 'nl' }).where(eq(users.email, 'host@example.org'));
    const { context, page } = await signedIn(browser, app.server.url, 'host', PHONE, 'en-GB');
    await page.goto(`${app.server.url}/events`);
    await page.getByRole('heading', { name: 'Reparatiemomenten', level: 1 }).waitFor();
    expect(await page.getAttribute('html', 'lang')).toBe('nl');
    await page.getByLabel('Taal').selectOption('de');
    await page.getByRole('heading', { name: 'Reparaturtermine', level: 1 }).waitFor();
    await expect
      .poll(async () => (await app.db.db.select().from(users).where(eq(users.email, 'host@example.org')))[0].language)
      .toBe('de');
    await context.close();
  });
});
