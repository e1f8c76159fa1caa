import { readFileSync } from 'node:fs';
import { and, asc, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { events } from '../../server/src/db/schema/index';
import { TODAY_TITLE } from '../../server/src/seed/demo-today';
import type { Agent } from '../support/http';
import { startDemoApi, type DemoApi } from '../support/demo-app';

/**
 * The kinds of item as the staff read them, in the language they ask in: the fixer's own queue, the organiser's
 * list of what is coming and the triage board. Expected names are our own catalog's (locales/<language>/categories.json).
 */
let app: DemoApi;
const as: Record<string, Agent> = {};
let today: number;
let next: number;

beforeAll(async () => {
  app = await startDemoApi();
  for (const who of ['organiser', 'fixer']) as[who] = await app.signIn(who);
  const [t] = await app.db.db.select().from(events).where(eq(events.title, TODAY_TITLE));
  today = t.id;
  const [n] = await app.db.db
    .select()
    .from(events)
    .where(and(eq(events.title, 'Kestlebridge repair session'), eq(events.status, 'published')))
    .orderBy(asc(events.startsAt));
  next = n.id;
});
afterAll(() => app.stop());

const names = (list: { categoryName: string }[]) => new Set(list.map((i) => i.categoryName));

describe('kinds of item in the reader’s language', () => {
  it('names the fixer’s queue in German', async () => {
    const de = await as.fixer.raw('GET', '/api/me/queue', { headers: { 'accept-language': 'de' } });
    const en = await as.fixer.raw('GET', '/api/me/queue', { headers: { 'accept-language': 'en' } });
    expect(de.status).toBe(200);
    expect(names(en.json)).toContain('Toaster or grill');
    expect(names(de.json)).toContain('Toaster oder Grill');
    expect(names(de.json)).not.toContain('Toaster or grill');
  });

  it('counts what is coming by kind in French', async () => {
    const fr = await as.organiser.raw('GET', `/api/events/${today}/bookings`, {
      headers: { 'accept-language': 'fr' },
    });
    expect(fr.status).toBe(200);
    const kinds = fr.json.summary.byCategory.map((c: { name: string }) => c.name);
    expect(kinds).toContain('Bouilloire');
    expect(kinds).not.toContain('Kettle');
  });

  it('names the triage board’s items in Dutch, each as the Dutch catalog names its kind', async () => {
    const board = async (lang: string) =>
      (await as.organiser.raw('GET', `/api/events/${next}/board`, { headers: { 'accept-language': lang } })).json
        .items as { id: number; categoryName: string }[];
    const [en, nl] = [await board('en'), await board('nl')];
    const catalog = (lang: string) =>
      JSON.parse(readFileSync(`locales/${lang}/categories.json`, 'utf8')) as Record<string, string>;
    const [enNames, nlNames] = [catalog('en'), catalog('nl')];
    const dutchFor = new Map(Object.entries(enNames).map(([key, name]) => [name, nlNames[key]]));
    expect(en.length).toBeGreaterThan(0);
    let differing = 0;
    for (const item of en) {
      const dutch = nl.find((i) => i.id === item.id)!.categoryName;
      expect(dutch).toBe(dutchFor.get(item.categoryName) ?? item.categoryName);
      if (dutch !== item.categoryName) differing += 1;
    }
    expect(differing).toBeGreaterThan(0);
  });

  it('names the follow-ups and the similar past repairs in German, as the German catalog names each kind', async () => {
    const de = JSON.parse(readFileSync('locales/de/categories.json', 'utf8')) as Record<string, string>;
    const german = new Set(Object.values(de));
    const [t] = await app.db.db.select().from(events).where(eq(events.id, today));
    const follow = await as.organiser.raw('GET', `/api/groups/${t.groupId}/follow-ups`, {
      headers: { 'accept-language': 'de' },
    });
    expect(follow.status).toBe(200);
    expect(follow.json.length).toBeGreaterThan(0);
    // An item reads "<kind> — <brand model>" or just the kind; each kind is a German catalog name.
    for (const f of follow.json as { item: string }[]) expect(german).toContain(f.item.split(' — ')[0]);
    const queue = (await as.fixer.raw('GET', '/api/me/queue', { headers: { 'accept-language': 'de' } })).json as {
      itemId: number;
    }[];
    expect(queue.length).toBeGreaterThan(0);
    const similar = await as.fixer.raw('GET', `/api/items/${queue[0].itemId}/similar`, {
      headers: { 'accept-language': 'de' },
    });
    expect(similar.status).toBe(200);
    for (const e of similar.json as { categoryName: string }[]) expect(german).toContain(e.categoryName);
  });
});
