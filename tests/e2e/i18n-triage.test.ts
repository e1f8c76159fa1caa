import { and, asc, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { events } from '../../server/src/db/schema/index';
import { DESKTOP, launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

/**
 * The organiser's triage board and a run's summary in the four languages (the `organise` namespace), and the board in the
 * pseudo-locale on a phone.
 */
let app: DemoApp;
let browser: Browser;
/** The demo's next Kestlebridge session: five benches, four fixers coming, nine bookings. */
let eventId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const [e] = await app.db.db
    .select()
    .from(events)
    .where(and(eq(events.title, 'Kestlebridge repair session'), eq(events.status, 'published')))
    .orderBy(asc(events.startsAt));
  eventId = e.id;
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const widthOf = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth);

const board = {
  en: {
    run: 'Run triage',
    waiting: 'Waiting',
    round: 'Round',
    link: 'what went in and came out',
    out: 'What came out',
    toy: 'Nobody here has toys at level 1 (learning) or above.',
  },
  nl: {
    run: 'Verdeling maken',
    waiting: 'Wacht',
    round: 'Ronde',
    link: 'wat erin ging en eruit kwam',
    out: 'Wat eruit kwam',
    toy: 'Niemand hier heeft de vaardigheid ‘speelgoed’ op niveau 1 (lerend) of hoger.',
  },
  de: {
    run: 'Verteilung starten',
    waiting: 'Wartend',
    round: 'Runde',
    link: 'was hineinging und herauskam',
    out: 'Was herauskam',
    toy: 'Niemand hier hat die Fähigkeit „Spielzeug“ auf Stufe 1 (lernend) oder höher.',
  },
  fr: {
    run: 'Lancer la répartition',
    waiting: 'En attente',
    round: 'Tour',
    link: 'ce qui est entré et sorti',
    out: 'Ce qui en est sorti',
    toy: 'Personne ici n’a la compétence « jouets » au niveau 1 (en apprentissage) ou au-dessus.',
  },
};

describe('the triage board and its runs in four languages', () => {
  it('runs triage and reads the run in each language at 1280 px', async () => {
    for (const [lang, words] of Object.entries(board)) {
      const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
      await page.goto(`${app.server.url}/events/${eventId}/board?lang=${lang}`);
      await page.getByRole('button', { name: words.run }).waitFor();
      expect(await page.getAttribute('html', 'lang')).toBe(lang);
      await page.getByLabel(words.round).waitFor();
      await page.getByText(words.waiting, { exact: true }).first().waitFor();
      if (lang !== 'en') {
        expect(await page.getByText('Run triage').count()).toBe(0);
        expect(await page.getByText(/fixers coming/).count()).toBe(0);
      }
      expect(await widthOf(page)).toBeLessThanOrEqual(DESKTOP.width);
      await page.getByRole('button', { name: words.run }).click();
      await page.getByRole('status').waitFor();
      if (lang !== 'en') expect(await page.getByRole('status').textContent()).not.toMatch(/Placed|wait/);
      // No fixer coming has the toys skill: the toy's card says why in the reader's language.
      await page.locator('article').filter({ hasText: words.toy }).first().waitFor();
      if (lang !== 'en') expect(await page.getByText(/Nobody here|busy with other items/).count()).toBe(0);
      await page.screenshot({ path: shot(`i18n-triage-board-${lang}`), fullPage: true });
      await page.locator('summary').first().click();
      await page.getByRole('link', { name: words.link }).first().click();
      await page.getByRole('heading', { name: words.out }).waitFor();
      if (lang !== 'en') expect(await page.getByText('What went in').count()).toBe(0);
      await page.getByRole('cell').filter({ hasText: words.toy }).first().waitFor();
      if (lang === 'de') {
        // The rules, needs, kit, skills and labels are German too (shared/triage/run-summary.ts gives their codes).
        const body = await page.locator('main').innerText();
        expect(body).toMatch(/Jeder Gegenstand geht an einen Reparateur/);
        expect(body).toMatch(/mindestens (lernend|versiert)/);
        expect(body).toMatch(/\((Experte|versiert|lernend)\)/);
        expect(body).not.toMatch(
          /Each item goes|slot by slot|placement was locked|placements were locked|Among the ways|or better|\((expert|capable|learning)\)|No fixer with|No bench with|Waiting for a free|\b(Item|Fixer|Bench) \d|no skills given|Soldering station|Sewing machine/,
        );
      }
      await page.screenshot({ path: shot(`i18n-triage-run-${lang}`), fullPage: true });
      await context.close();
    }
  });

  it('fits the pseudo-locale (longer, accented) on the board at 390 px', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', PHONE);
    await page.goto(`${app.server.url}/events/${eventId}/board?lang=xx-pseudo`);
    await page.getByRole('button', { name: /^R[üu]+[ñn]+ tr/ }).waitFor();
    expect(await page.getByText('Run triage', { exact: true }).count()).toBe(0);
    expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
    await page.screenshot({ path: shot('i18n-triage-board-pseudo-390'), fullPage: true });
    await context.close();
  });
});
