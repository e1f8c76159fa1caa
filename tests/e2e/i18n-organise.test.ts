import { and, asc, eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { events, repairGroups } from '../../server/src/db/schema/index';
import { DESKTOP, launchBrowser, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

/**
 * The organiser's pages in the organiser's language at 1280 px: the group's sessions, a new session's form and one
 * session's own page (its slots, what is coming and calling it off), with the group's and the session's tabs.
 */
let app: DemoApp;
let browser: Browser;
let groupId: number;
let eventId: number;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const [g] = await app.db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
  groupId = g.id;
  const [e] = await app.db.db
    .select({ id: events.id })
    .from(events)
    .where(and(eq(events.groupId, g.id), eq(events.status, 'published'), sql`${events.startsAt} > NOW()`))
    .orderBy(asc(events.startsAt));
  eventId = e.id;
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

/** The page's own content (the shell's header and its menu are not these pages' words). */
const widthOf = (page: Page) =>
  page.evaluate(() =>
    Math.max(
      document.querySelector('main')!.scrollWidth,
      document.querySelector('main')!.getBoundingClientRect().right,
    ),
  );

const expected = {
  nl: {
    coming: 'Vandaag en binnenkort',
    tab: 'Regels en locaties',
    newTitle: 'Nieuw reparatiemoment',
    slotLength: 'Lengte tijdvak (minuten)',
    slots: 'Tijdvakken',
    callOff: 'Het reparatiemoment afgelasten',
    eventTab: 'Rooster',
  },
  de: {
    coming: 'Heute und demnächst',
    tab: 'Regeln und Orte',
    newTitle: 'Neuer Termin',
    slotLength: 'Länge des Zeitfensters (Minuten)',
    slots: 'Zeitfenster',
    callOff: 'Den Termin absagen',
    eventTab: 'Dienstplan',
  },
  fr: {
    coming: 'Aujourd’hui et à venir',
    tab: 'Règles et lieux',
    newTitle: 'Nouvel atelier',
    slotLength: 'Durée d’un créneau (minutes)',
    slots: 'Créneaux',
    callOff: 'Annuler l’atelier',
    eventTab: 'Planning',
  },
};

describe('the organiser’s pages in four languages at 1280 px', () => {
  it('shows the sessions list, the new session form and a session’s page in the asked language', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    for (const [lang, words] of Object.entries(expected)) {
      await page.goto(`${app.server.url}/groups/${groupId}/events?lang=${lang}`);
      await page.getByRole('heading', { level: 2, name: words.coming }).waitFor();
      expect(await page.getAttribute('html', 'lang')).toBe(lang);
      await page.getByRole('link', { name: words.tab }).waitFor();
      expect(await page.getByText('Today and coming up').count()).toBe(0);
      expect(await page.getByText('Rules and venues').count()).toBe(0);
      expect(await page.getByText(/items? seen/).count()).toBe(0);
      expect(await widthOf(page)).toBeLessThanOrEqual(DESKTOP.width);
      await page.screenshot({ path: shot(`i18n-organise-sessions-${lang}`), fullPage: true });

      await page.goto(`${app.server.url}/groups/${groupId}/events/new?lang=${lang}`);
      await page.getByRole('heading', { level: 1, name: words.newTitle }).waitFor();
      await page.getByLabel(words.slotLength).waitFor();
      expect(await page.getByText('Create the draft').count()).toBe(0);
      expect(await widthOf(page)).toBeLessThanOrEqual(DESKTOP.width);

      await page.goto(`${app.server.url}/events/${eventId}/manage?lang=${lang}`);
      await page.getByRole('heading', { level: 2, name: words.slots, exact: true }).waitFor();
      await page.getByRole('heading', { name: words.callOff }).waitFor();
      await page.getByRole('link', { name: words.eventTab }).waitFor();
      expect(await page.getByText('What is coming').count()).toBe(0);
      expect(await page.getByText('Calling the session off').count()).toBe(0);
      expect(await widthOf(page)).toBeLessThanOrEqual(DESKTOP.width);
      await page.screenshot({ path: shot(`i18n-organise-manage-${lang}`), fullPage: true });
    }
    await context.close();
  });

  it('fits the pseudo-locale (longer, accented) at 1280 px', async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    const pages = {
      sessions: `/groups/${groupId}/events`,
      new: `/groups/${groupId}/events/new`,
      manage: `/events/${eventId}/manage`,
    };
    for (const [name, path] of Object.entries(pages)) {
      await page.goto(`${app.server.url}${path}?lang=xx-pseudo`);
      await page.getByRole('heading', { level: 1 }).waitFor();
      await page.waitForLoadState('networkidle');
      expect(await page.getAttribute('html', 'lang')).toBe('en-XA');
      await page.screenshot({ path: shot(`i18n-organise-${name}-pseudo`), fullPage: true });
      expect(await widthOf(page), name).toBeLessThanOrEqual(DESKTOP.width);
    }
    await context.close();
  });
});
