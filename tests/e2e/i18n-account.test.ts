import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, PHONE, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

/**
 * The pages a visitor or a new volunteer meets outside the booking path, in their language: signing in, signing up,
 * the return-visit link and the waiting-list offer. Their words come in the on-demand 'account' namespace, fetched
 * with the page, and fetched again in the new language when the picker changes it.
 */
let app: DemoApp;
let browser: Browser;
let groupId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const groups = await (await fetch(`${app.server.url}/api/public/groups`)).json();
  groupId = groups.find((g: { name: string }) => g.name === 'Kestlebridge Menders').id;
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const widthOf = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth);

const signIn = {
  en: { heading: 'Sign in', password: 'Password', demo: 'Demo accounts', volunteer: 'Volunteer with a repair group' },
  nl: { heading: 'Inloggen', password: 'Wachtwoord', demo: 'Demo-accounts', volunteer: 'Word vrijwilliger' },
  de: { heading: 'Anmelden', password: 'Passwort', demo: 'Demo-Konten', volunteer: 'Helfen Sie bei einer' },
  fr: {
    heading: 'Se connecter',
    password: 'Mot de passe',
    demo: 'Comptes de démonstration',
    volunteer: 'Devenez bénévole',
  },
} as const;

describe('the account pages in four languages', () => {
  it.each(Object.keys(signIn) as (keyof typeof signIn)[])(
    'signs in and signs up in %s at 390 px',
    { timeout: 60_000 },
    async (lang) => {
      const page = await browser.newPage({ viewport: PHONE });
      await page.goto(`${app.server.url}/sign-in?lang=${lang}`);
      const words = signIn[lang];
      await page.getByRole('heading', { name: words.heading, exact: true }).waitFor();
      expect(await page.evaluate(() => document.documentElement.lang)).toBe(lang);
      await page.getByLabel(words.password, { exact: true }).waitFor();
      await page.getByRole('heading', { name: words.demo }).waitFor();
      const main = (await page.locator('main').innerText()).replace(/\S+@example\.org/g, '');
      if (lang !== 'en') {
        // Only the demo groups' own names stay as they are.
        for (const english of ['Forgot your password', 'Visitors do not need', 'Demo accounts', 'Network admin'])
          expect(main).not.toContain(english);
      }
      await page.screenshot({ path: shot(`i18n-sign-in-${lang}`), fullPage: true });
      await page.goto(`${app.server.url}/volunteer?lang=${lang}`);
      await page.getByRole('heading', { name: words.volunteer }).waitFor();
      expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
      await page.close();
    },
  );

  it('fetches the page words again in the language picked on the page', { timeout: 60_000 }, async () => {
    const context = await browser.newContext({ viewport: PHONE, locale: 'en-GB' });
    const page = await context.newPage();
    await page.goto(`${app.server.url}/sign-in`);
    await page.getByRole('heading', { name: 'Sign in', exact: true }).waitFor();
    const fetched: string[] = [];
    page.on('response', (r) => fetched.push(r.url()));
    await page.getByLabel('Language').selectOption('fr');
    await page.getByRole('heading', { name: 'Se connecter', exact: true }).waitFor();
    await page.getByLabel('Mot de passe', { exact: true }).waitFor();
    // The French core chunk and the French 'account' chunk, and not the English ones again.
    expect(fetched.filter((u) => /\/assets\/.*\.js$/.test(u)).length).toBeGreaterThanOrEqual(2);
    await context.close();
  });

  it('fits the pseudo-locale at 390 px on sign-in and sign-up', { timeout: 60_000 }, async () => {
    const page = await browser.newPage({ viewport: PHONE });
    for (const path of ['/sign-in', '/volunteer', '/forgot-password']) {
      await page.goto(`${app.server.url}${path}?lang=xx-pseudo`);
      await page.locator('main h1, main h2').first().waitFor();
      expect(await page.evaluate(() => document.documentElement.lang)).toBe('en-XA');
      // Nothing left in plain English: a pseudo-locale text carries accents.
      expect(await page.locator('main h1').first().innerText()).toMatch(/[àéïöüçñý]/);
      expect(await widthOf(page), path).toBeLessThanOrEqual(PHONE.width);
    }
    await page.screenshot({ path: shot('i18n-pseudo-forgot-password'), fullPage: true });
    await page.close();
  });

  it(
    'books a return visit in German: the kind of item from the server in German, German times',
    { timeout: 60_000 },
    async () => {
      const { context } = await signedIn(browser, app.server.url, 'organiser', { width: 1024, height: 800 });
      const list = await (await context.request.get(`${app.server.url}/api/groups/${groupId}/follow-ups`)).json();
      const open = list.find((f: { status: string }) => f.status === 'open' || f.status === 'part-ordered');
      const token = new URL(open.rebookUrl).pathname.split('/').pop()!;
      const view = async (lang: string) =>
        (await (await fetch(`${app.server.url}/api/rebook/${token}`, { headers: { 'accept-language': lang } })).json())
          .item.categoryName as string;
      const [english, german] = [await view('en'), await view('de')];
      expect(german).not.toBe(english);

      const page = await browser.newPage({ viewport: PHONE });
      await page.goto(`${app.server.url}/rebook/${token}?lang=de`);
      await page.getByRole('heading', { name: /^Hallo / }).waitFor();
      await page.getByText('Ihr Gegenstand').waitFor();
      expect(await page.locator('dd').first().innerText()).toContain(german);
      // A time tile says its places in German to a screen reader ("3 Plätze frei"), and the time is 24-hour.
      const tile = page.getByRole('button', { name: /\d{2}:\d{2} \d+ Plätze? frei/ }).first();
      await tile.waitFor();
      await tile.click();
      const dialog = page.getByRole('dialog');
      await dialog.getByText(/ um \d{2}:\d{2}, mit Ihrem Gegenstand/).waitFor();
      expect(await dialog.innerText()).toContain(german);
      await page.screenshot({ path: shot('i18n-rebook-de'), fullPage: true });
      await dialog.getByRole('button', { name: 'Andere Zeit wählen' }).click();
      expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
      await context.close();
      await page.close();
    },
  );
  it(
    "shows a group's own page in the group's language to a browser that speaks none of ours, until the picker says otherwise",
    { timeout: 60_000 },
    async () => {
      const list = await (await fetch(`${app.server.url}/api/events`)).json();
      const dutch = list.find((e: { groupName: string }) => e.groupName === 'Herstelkring Kernebroek');
      const english = list.find((e: { groupName: string }) => e.groupName === 'Kestlebridge Menders');
      const context = await browser.newContext({ viewport: PHONE, locale: 'pt-BR' });
      const page = await context.newPage();
      await page.goto(`${app.server.url}/events/${dutch.id}`);
      await page.getByRole('link', { name: 'Boek een tijdvak' }).first().waitFor();
      expect(await page.evaluate(() => document.documentElement.lang)).toBe('nl');
      await page.screenshot({ path: shot('i18n-group-language-nl'), fullPage: true });
      // An English-speaking group's page stays English for the same visitor.
      const other = await context.newPage();
      await other.goto(`${app.server.url}/events/${english.id}`);
      await other.getByRole('link', { name: 'Book a slot' }).first().waitFor();
      expect(await other.evaluate(() => document.documentElement.lang)).toBe('en');
      // The picker's choice wins over the group's language from then on.
      await page.getByLabel('Taal').selectOption('en');
      await page.getByRole('link', { name: 'Book a slot' }).first().waitFor();
      await page.reload();
      await page.getByRole('link', { name: 'Book a slot' }).first().waitFor();
      expect(await page.evaluate(() => document.documentElement.lang)).toBe('en');
      await context.close();
      // A browser that reads German keeps German on the Dutch group's page.
      const german = await browser.newContext({ viewport: PHONE, locale: 'de-DE' });
      const dePage = await german.newPage();
      await dePage.goto(`${app.server.url}/events/${dutch.id}`);
      await dePage.getByRole('heading', { name: 'Repareren in De Spoel' }).waitFor();
      expect(await dePage.evaluate(() => document.documentElement.lang)).toBe('de');
      await german.close();
    },
  );
});
