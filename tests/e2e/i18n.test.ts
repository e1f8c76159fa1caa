import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { formatDay } from '../../shared/format';
import { events, repairGroups } from '../../server/src/db/schema/index';
import { launchBrowser, PHONE, shot } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';
import { makeEvent, makeGroup } from '../support/factories';

// The visitor's language on the public pages: the browser's choice on a first visit, the picker's choice after it,
// and room for longer words at 390 px (the pseudo-locale: English with accents, about 35 % longer).
let app: DemoApp;
let browser: Browser;
let eventId: number;
let startsAt: Date;
let tz: string;
let groupId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const db = app.db.db;
  groupId = await makeGroup(db, `Taalgroep ${Date.now()}`);
  [{ timeZone: tz }] = await db.select().from(repairGroups).where(eq(repairGroups.id, groupId));
  ({ eventId } = await makeEvent(db, groupId, { capacity: 4, slotCount: 4 }));
  [{ startsAt }] = await db.select().from(events).where(eq(events.id, eventId));
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const widthOf = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth);

describe('the public pages in the visitor’s language', () => {
  it('/events with a Dutch browser: Dutch words, lang="nl" and Dutch dates', async () => {
    const context = await browser.newContext({ viewport: PHONE, locale: 'nl-NL' });
    const page = await context.newPage();
    await page.goto(`${app.server.url}/events`);
    await page.getByRole('heading', { name: 'Reparatiemomenten', level: 1 }).waitFor();
    expect(await page.getAttribute('html', 'lang')).toBe('nl');
    await page.getByLabel('Wat moet er gemaakt worden?').waitFor();
    // The date as CLDR writes it in Dutch (weekday and month names in Dutch, e.g. "zaterdag 5 december 2026").
    const day = formatDay(startsAt, tz, 'nl');
    expect(day).toMatch(/^(maandag|dinsdag|woensdag|donderdag|vrijdag|zaterdag|zondag) /);
    await page.getByText(day, { exact: false }).first().waitFor();
    expect(await page.getByText('Repair sessions').count()).toBe(0);
    await page.screenshot({ path: shot('i18n-events-nl'), fullPage: true });
    // The month calendar too: Dutch month names on its buttons, Dutch weekday heads (CLDR nl: "ma", "di", …),
    // weeks from Monday (CLDR's first day for the Netherlands).
    await page.getByRole('button', { name: 'Kalender' }).click();
    const next = new Date();
    next.setDate(1);
    next.setMonth(next.getMonth() + 1);
    const month = new Intl.DateTimeFormat('nl', { month: 'long', year: 'numeric' }).format(next);
    await page.getByRole('button', { name: `Volgende maand, ${month}` }).waitFor();
    const heads = (await page.locator('.fc-col-header-cell').allTextContents()).map((h) => h.trim());
    expect(heads[0]).toMatch(/^ma\.?$/);
    expect(heads).toHaveLength(7);
    await page.screenshot({ path: shot('i18n-calendar-nl'), fullPage: true });
    await context.close();
  });

  it('the picker switches to French, and a reload remembers it', async () => {
    const context = await browser.newContext({ viewport: PHONE, locale: 'en-GB' });
    const page = await context.newPage();
    await page.goto(`${app.server.url}/events`);
    await page.getByRole('heading', { name: 'Repair sessions', level: 1 }).waitFor();
    await page.locator('option', { hasText: 'Kettle' }).waitFor({ state: 'attached' });
    const picker = page.getByLabel('Language');
    await picker.focus();
    await picker.selectOption('fr');
    await page.getByRole('heading', { name: 'Ateliers de réparation', level: 1 }).waitFor();
    expect(await page.getAttribute('html', 'lang')).toBe('fr');
    // The kinds of item in the filter are read again, in French, without a reload.
    await page.locator('option', { hasText: 'Bouilloire' }).waitFor({ state: 'attached' });
    expect(await page.locator('option', { hasText: 'Kettle' }).count()).toBe(0);
    await page.reload();
    await page.getByRole('heading', { name: 'Ateliers de réparation', level: 1 }).waitFor();
    expect(await page.getAttribute('html', 'lang')).toBe('fr');
    expect(await page.getByLabel('Langue').inputValue()).toBe('fr');
    // After the reload too: the page's early reads (asked for in the browser's English) are not used for French.
    await page.locator('option', { hasText: 'Bouilloire' }).waitFor({ state: 'attached' });
    expect(await page.locator('option', { hasText: 'Kettle' }).count()).toBe(0);
    await context.close();
  });

  it('the pseudo-locale fits at 390 px on /events, the session page and the booking page', async () => {
    const context = await browser.newContext({ viewport: PHONE });
    const page = await context.newPage();
    await page.goto(`${app.server.url}/events?lang=xx-pseudo`);
    await page.getByRole('heading', { level: 1 }).waitFor();
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toMatch(/R[ée]+p[àa]+[ïi]+r/);
    expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
    await page.screenshot({ path: shot('i18n-events-pseudo'), fullPage: true });
    await page.goto(`${app.server.url}/events/${eventId}?lang=xx-pseudo`);
    await page
      .getByRole('link', { name: /B[öo]+k/ })
      .first()
      .waitFor();
    expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
    await page.screenshot({ path: shot('i18n-session-pseudo'), fullPage: true });
    await page.goto(`${app.server.url}/events/${eventId}/book?lang=xx-pseudo`);
    await page.getByRole('button', { name: /B[öo]+k m[ýy]/ }).waitFor();
    expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
    await page.screenshot({ path: shot('i18n-book-pseudo'), fullPage: true });
    await page.goto(`${app.server.url}/safety?lang=xx-pseudo`);
    await page.getByRole('heading', { level: 2 }).first().waitFor();
    expect(await page.getByRole('heading', { level: 2 }).count()).toBe(7);
    expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
    await context.close();
  });

  it('the piece for other websites in German: its sentence, German number forms, and still within 360 × 260', async () => {
    const [{ id: demoGroup }] = await app.db.db
      .select({ id: repairGroups.id })
      .from(repairGroups)
      .where(eq(repairGroups.slug, 'kestlebridge-menders'));
    const context = await browser.newContext({ viewport: { width: 360, height: 260 }, locale: 'de-DE' });
    const page = await context.newPage();
    const d = await (await page.request.get(`${app.server.url}/api/public/impact?groupId=${demoGroup}`)).json();
    await page.goto(`${app.server.url}/embed/impact?group=${demoGroup}`);
    await page.getByTestId('widget-fixed').waitFor();
    const sentence = await page.getByTestId('widget-fixed').locator('xpath=ancestor::p[1]').innerText();
    expect(sentence).toMatch(/^Bisher .* repariert: So blieben .* kg aus dem Müll/);
    // German writes a decimal comma and groups thousands with a dot (CLDR de number symbols).
    expect(d.kgDiverted).toBeGreaterThan(0);
    expect(await page.getByTestId('widget-kg').innerText()).toBe(
      new Intl.NumberFormat('de', { minimumFractionDigits: 1, maximumFractionDigits: 1 }).format(d.kgDiverted),
    );
    expect(await page.getByTestId('widget-kg').innerText()).toMatch(/,\d$/);
    await page.getByRole('link', { name: /Gezählt mit Mendery/ }).waitFor();
    const fits = await page
      .getByTestId('impact-widget')
      .evaluate((n) => n.scrollHeight <= n.clientHeight && n.scrollWidth <= n.clientWidth);
    expect(fits).toBe(true);
    await page.screenshot({ path: shot('i18n-widget-de') });
    await context.close();
  });

  it('the safety page and a group’s privacy page in German', async () => {
    const context = await browser.newContext({ viewport: PHONE, locale: 'de-DE' });
    const page = await context.newPage();
    await page.goto(`${app.server.url}/safety`);
    await page.getByRole('heading', { name: 'Sicherheit an der Werkbank', level: 1 }).waitFor();
    // The capacitor caution keeps its figure (about 300 V DC on a switch-mode supply's capacitors; trade practice).
    await page.getByText(/rund 300 V Gleichspannung/).waitFor();
    await page.screenshot({ path: shot('i18n-safety-de'), fullPage: true });
    await page.goto(`${app.server.url}/groups/${groupId}/privacy`);
    await page.getByRole('heading', { name: /^Ihre Daten bei /, level: 1 }).waitFor();
    await page.getByRole('heading', { name: 'Was wir speichern', level: 2 }).waitFor();
    expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
    await context.close();
  });

  it('the landing page in Dutch, and a booking made in German ends on its own page in German', async () => {
    const nl = await browser.newContext({ viewport: PHONE, locale: 'nl-BE' });
    const home = await nl.newPage();
    await home.goto(`${app.server.url}/`);
    await home.getByRole('link', { name: 'Zoek een reparatiemoment en boek' }).waitFor();
    expect(await home.getAttribute('html', 'lang')).toBe('nl');
    expect(await widthOf(home)).toBeLessThanOrEqual(PHONE.width);
    await nl.close();

    const context = await browser.newContext({ viewport: PHONE, locale: 'de-DE' });
    const page = await context.newPage();
    await page.goto(`${app.server.url}/events/${eventId}/book`);
    await page.getByRole('heading', { name: 'Reparaturtermin buchen', level: 1 }).waitFor();
    await page.locator('label', { hasText: '4 frei' }).first().click();
    await page.getByLabel('Ihr Name').fill('Wiebke Sandhage');
    await page.getByLabel('E-Mail').fill('wiebke@example.org');
    // The kinds of item come from the API in the reader's language too.
    await page.getByLabel('Was ist es?').selectOption({ label: 'Wasserkocher' });
    await page.getByLabel('Was ist kaputt?').fill('Schaltet nach wenigen Sekunden ab.');
    await page.getByLabel(/Ich akzeptiere die Hausregeln/).check();
    await page.getByRole('button', { name: 'Zeitfenster buchen' }).click();
    await page.getByText('Sie sind gebucht').waitFor({ timeout: 15_000 });
    await page.getByText('Buchungsnummer').waitFor();
    await page.getByRole('button', { name: 'Meine Buchung stornieren' }).waitFor();
    expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
    await page.screenshot({ path: shot('i18n-manage-de'), fullPage: true });
    await context.close();
  });

  it('the booking page in each language: its words and its safety questions, within 390 px', async () => {
    const expected = {
      en: { title: 'Book a repair slot', gas: 'It runs on gas', submit: 'Book my slot' },
      nl: { title: 'Boek een tijdvak voor je reparatie', gas: 'Het werkt op gas', submit: 'Boek mijn tijdvak' },
      de: { title: 'Reparaturtermin buchen', gas: 'Es läuft mit Gas', submit: 'Zeitfenster buchen' },
      fr: { title: 'Réserver un créneau de réparation', gas: 'Il fonctionne au gaz', submit: 'Réserver mon créneau' },
    };
    for (const [lang, words] of Object.entries(expected)) {
      const context = await browser.newContext({ viewport: PHONE, locale: lang });
      const page = await context.newPage();
      await page.goto(`${app.server.url}/events/${eventId}/book`);
      await page.getByRole('heading', { name: words.title, level: 1 }).waitFor();
      expect(await page.getAttribute('html', 'lang')).toBe(lang);
      await page.getByText(words.gas).first().waitFor();
      await page.getByRole('button', { name: words.submit }).waitFor();
      if (lang !== 'en') expect(await page.getByText('Book my slot').count()).toBe(0);
      expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
      await page.screenshot({ path: shot(`i18n-book-${lang}`), fullPage: true });
      await page.goto(`${app.server.url}/events`);
      await page.getByRole('heading', { level: 1 }).waitFor();
      expect(await widthOf(page)).toBeLessThanOrEqual(PHONE.width);
      await page.screenshot({ path: shot(`i18n-events-${lang}`), fullPage: true });
      await context.close();
    }
  });
});
