import { and, eq, isNotNull } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { bookingItems, bookings, events } from '../../server/src/db/schema/index';
import { TODAY_TITLE } from '../../server/src/seed/demo-today';
import { launchBrowser, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

/**
 * The day's screens in the reader's language: the reception desk on its 820 px tablet (the list, a check-in, a
 * walk-in's checks), the printed tag sheet, the hall's screen, the organiser's live view and the page a scanned tag
 * opens. The kinds of item and the outcomes come from the API in the same language. Expected words are our own
 * catalogs' (locales/<language>/desk.json, categories.json, fixer.json); decimal commas per CLDR for nl, de and fr.
 */
let app: DemoApp;
let browser: Browser;
let eventId: number;
let waitingTag: string;
const TABLET = { width: 820, height: 1180 };

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const [e] = await app.db.db.select().from(events).where(eq(events.title, TODAY_TITLE));
  eventId = e.id;
  const [item] = await app.db.db
    .select({ tagCode: bookingItems.tagCode })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .where(and(eq(bookings.reference, 'T4M-8RS'), isNotNull(bookingItems.tagCode)));
  waitingTag = item.tagCode!;
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const pageWidth = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth);

const desk = {
  nl: {
    title: 'Ontvangst',
    search: 'Boekingscode of naam',
    kettle: 'Waterkoker',
    checkIn: 'T5N-9WZ inschrijven',
    arrived: 'Aangekomen',
    walkIn: 'Nieuw zonder afspraak',
    walkInForm: 'Zonder afspraak',
    nameRequired: 'Vul de naam van de bezoeker in.',
  },
  de: {
    title: 'Empfang',
    search: 'Buchungscode oder Name',
    kettle: 'Wasserkocher',
    checkIn: 'T5N-9WZ anmelden',
    arrived: 'Angekommen',
    walkIn: 'Neu ohne Termin',
    walkInForm: 'Ohne Termin',
    nameRequired: 'Geben Sie den Namen der Person ein.',
  },
  fr: {
    title: 'Accueil',
    search: 'Code de réservation ou nom',
    kettle: 'Bouilloire',
    checkIn: 'Enregistrer T5N-9WZ',
    arrived: 'Arrivé',
    walkIn: 'Nouveau sans rendez-vous',
    walkInForm: 'Sans rendez-vous',
    nameRequired: 'Indiquez le nom du visiteur.',
  },
};

describe('the day’s screens in four languages', () => {
  it('runs the reception desk in nl, de and fr on the 820 px tablet', { timeout: 120_000 }, async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'host', TABLET);
    for (const [lang, w] of Object.entries(desk)) {
      await page.goto(`${app.server.url}/desk/${eventId}?lang=${lang}`);
      await page.getByRole('heading', { level: 1, name: w.title }).waitFor();
      expect(await page.getAttribute('html', 'lang')).toBe(lang);
      await page.getByLabel(w.search).waitFor();
      // The kind of item comes from the API in the desk's language.
      await page
        .getByRole('button', { name: /T2D-4KX/ })
        .getByText(w.kettle)
        .waitFor();
      expect(await page.getByText('Reference or name').count()).toBe(0);
      expect(await page.getByText('Print all tags').count()).toBe(0);

      await page.getByRole('button', { name: /T5N-9WZ/ }).click();
      const form = page.getByRole('form', { name: w.checkIn });
      await form.getByRole('radio', { name: w.arrived }).first().waitFor({ state: 'attached' });
      expect(await pageWidth(page)).toBeLessThanOrEqual(TABLET.width);
      await page.screenshot({ path: shot(`i18n-desk-checkin-${lang}`), fullPage: true });

      // A walk-in sent empty: the shared schema's message, in the desk's language.
      await page.getByRole('button', { name: w.walkIn }).first().click();
      const walkIn = page.getByRole('form', { name: w.walkInForm });
      await walkIn.locator('button[type=submit]').click();
      await walkIn.getByText(w.nameRequired).first().waitFor();
      expect(await pageWidth(page)).toBeLessThanOrEqual(TABLET.width);
    }
    await context.close();
  });

  it('prints the tag sheet in German, with the stock’s sizes written the German way', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'host', TABLET);
    await page.goto(`${app.server.url}/events/${eventId}/tags?lang=de`);
    await page.getByRole('heading', { level: 1, name: /Etiketten für die Gegenstände/ }).waitFor();
    await page.getByRole('option', { name: 'A4-Bogen, 24 Etiketten 63,5 × 33,9 mm (3 × 8)' }).waitFor({
      state: 'attached',
    });
    const tags = page.getByTestId('tag');
    await tags.first().waitFor();
    expect(await tags.filter({ hasText: 'Wasserkocher' }).count()).toBe(1);
    expect(await tags.filter({ hasText: 'Nr. ' }).count()).toBe(await tags.count());
    expect(await page.getByText('Intake tags').count()).toBe(0);
    await page.screenshot({ path: shot('i18n-desk-tags-de'), fullPage: true });
    await context.close();
  });

  it('shows the hall’s screen in French and the live view in Dutch', async () => {
    const hall = await browser.newPage({ viewport: { width: 1280, height: 720 } });
    await hall.goto(`${app.server.url}/events/${eventId}/hall?lang=fr`);
    await hall.getByRole('heading', { name: 'En ce moment aux établis' }).waitFor();
    await hall.getByRole('heading', { name: /En attente/ }).waitFor();
    expect(await hall.getAttribute('html', 'lang')).toBe('fr');
    expect(await hall.getByText(/réparateurs? présents?/).count()).toBe(1);
    await hall.screenshot({ path: shot('i18n-desk-hall-fr') });
    await hall.close();

    const { context, page } = await signedIn(browser, app.server.url, 'organiser', { width: 1280, height: 860 });
    await page.goto(`${app.server.url}/events/${eventId}/live?lang=nl`);
    await page.getByRole('heading', { name: 'Reparateurs in dienst' }).waitFor();
    // The outcome and the kind are the API's, in Dutch.
    await page.getByText('Gerepareerd').first().waitFor();
    await page
      .getByText(/Waterkoker — Brewmaster/)
      .first()
      .waitFor();
    expect(await page.getByText('Fixers on shift').count()).toBe(0);
    await page.screenshot({ path: shot('i18n-desk-live-nl'), fullPage: true });
    await context.close();
  });

  it('tells a visitor who scans a tag where the item stands, in French', async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await page.goto(`${app.server.url}/t/${waitingTag}?lang=fr`);
    await page.getByRole('heading', { level: 1, name: 'Grille-pain ou gril' }).waitFor();
    await page.getByText('Numéro d’attente').waitFor();
    await page.getByText('Cette page se met à jour toute seule.', { exact: false }).waitFor();
    expect(await page.getByText('Queue number').count()).toBe(0);
    await page.close();
  });

  it('fits the pseudo-locale (longer, accented) on the 820 px tablet', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'host', TABLET);
    await page.goto(`${app.server.url}/desk/${eventId}?lang=xx-pseudo`);
    await page.getByRole('heading', { level: 1 }).waitFor();
    await page.getByRole('button', { name: /T5N-9WZ/ }).click();
    await page.waitForLoadState('networkidle');
    expect(await page.getAttribute('html', 'lang')).toBe('en-XA');
    await page.screenshot({ path: shot('i18n-desk-pseudo'), fullPage: true });
    expect(await pageWidth(page)).toBeLessThanOrEqual(TABLET.width);
    await context.close();
  });
  it('keeps an organiser’s top menu within 1280 px in German and the pseudo-locale', async () => {
    const desktop = { width: 1280, height: 860 };
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', desktop);
    for (const lang of ['de', 'xx-pseudo']) {
      await page.goto(`${app.server.url}/events/${eventId}/live?lang=${lang}`);
      await page.getByRole('heading', { level: 1 }).waitFor();
      await page.waitForLoadState('networkidle');
      const nav = page.getByRole('navigation').first();
      const right = await nav.evaluate((n) =>
        Math.max(...[...n.querySelectorAll('li')].map((li) => li.getBoundingClientRect().right)),
      );
      expect(right, lang).toBeLessThanOrEqual(desktop.width);
      expect(await pageWidth(page), lang).toBeLessThanOrEqual(desktop.width);
      await page.screenshot({ path: shot(`i18n-desk-menu-${lang}`) });
    }
    await context.close();
  });
});
