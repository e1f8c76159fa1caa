import { and, eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../shared/constants';
import {
  bookingItems,
  bookings,
  events,
  itemOutcomes,
  outbox,
  repairGroups,
  users,
} from '../../server/src/db/schema/index';
import { runRetention } from '../../server/src/features/privacy/erase';
import { seedDemo } from '../../server/src/seed/demo';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, makeUser, PASSWORD } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer, TEST_SECRET } from '../support/server';

/** Issue 14, personal data: retention, erasure, a copy of one's data, closing an account, the privacy page. */
let db: TestDatabase;
let server: RunningServer;
let demoGroupId: number;
const as: Record<string, Agent> = {};

beforeAll(async () => {
  db = await createTestDatabase();
  await seedDemo(db.db, { linkSecret: TEST_SECRET });
  server = await startTestServer(db.url);
  const [g] = await db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
  demoGroupId = g.id;
  for (const who of ['organiser', 'fixer', 'admin']) {
    as[who] = new Agent(server.url);
    expect((await as[who].login(`${who}@example.org`, DEMO_PASSWORD)).status).toBe(200);
  }
  as.anon = new Agent(server.url);
}, 120_000);
afterAll(async () => {
  await server.stop();
  await db.drop();
});

/** Every text-like column of every table, and where each of the needles is found in them. */
async function findAnywhere(needles: string[]): Promise<string[]> {
  const [cols] = (await db.db.execute(sql`
    SELECT TABLE_NAME AS t, COLUMN_NAME AS c FROM information_schema.COLUMNS
    WHERE TABLE_SCHEMA = DATABASE() AND DATA_TYPE IN ('varchar', 'char', 'text', 'mediumtext', 'longtext', 'json')
      AND TABLE_NAME <> '__drizzle_migrations'`)) as unknown as [{ t: string; c: string }[]];
  const found: string[] = [];
  for (const { t, c } of cols)
    for (const n of needles) {
      const [rows] = (await db.db.execute(
        sql`SELECT COUNT(*) AS n FROM ${sql.identifier(t)} WHERE LOCATE(LOWER(${n}), LOWER(${sql.identifier(c)})) > 0`,
      )) as unknown as [{ n: number }[]];
      if (Number(rows[0].n)) found.push(`${t}.${c} holds "${n}"`);
    }
  return found;
}

const exportsOf = async (groupId: number) =>
  [
    await as.organiser.get(`/api/exports/records.csv?groupId=${groupId}`),
    await as.organiser.get(`/api/exports/open-repair-data.csv?groupId=${groupId}`),
    await as.organiser.get(`/api/exports/open-repair-data-unpowered.csv?groupId=${groupId}`),
  ].map((r) => {
    expect(r.status).toBe(200);
    return r.text;
  });

describe('the retention job', () => {
  it('anonymises visitors of sessions past the period; statistics stay equal; no trace in any table or export', async () => {
    const stats = async () => (await as.organiser.get(`/api/stats?groupId=${demoGroupId}`)).json;
    const before = await stats();
    expect(before.items ?? before).toBeTruthy();
    const people = await db.db
      .select({ name: bookings.visitorName, email: bookings.visitorEmail, phone: bookings.visitorPhone })
      .from(bookings)
      .innerJoin(events, eq(events.id, bookings.eventId))
      .where(and(eq(events.groupId, demoGroupId), sql`${events.endsAt} < CURRENT_TIMESTAMP(3)`));
    expect(people.length).toBeGreaterThan(5);
    const needles = [
      ...new Set(people.flatMap((p) => [p.name, p.email ?? '', p.phone ?? '']).filter((s) => s.length >= 6)),
    ];
    expect(await findAnywhere(needles.slice(0, 3))).not.toEqual([]);

    // A month's keeping, and a day that is more than a month after every past session of the demo.
    expect((await as.organiser.send('PUT', `/api/groups/${demoGroupId}/settings`, { retentionMonths: 1 })).status).toBe(
      200,
    );
    const later = new Date(Date.now() + 32 * 24 * 3600_000);
    const n = await runRetention(server.ctx, later);
    expect(n).toBeGreaterThanOrEqual(people.length);
    // Once a day: a second run at the same moment does nothing.
    expect(await runRetention(server.ctx, later)).toBe(0);

    expect(await stats()).toEqual(before);
    // Invented names repeat: a name still on a later session's booking, or another group's (or inside one, as
    // "Ana Corran" in "Hana Corran"), is someone else's.
    const live = new Set(
      (
        await db.db
          .select({ name: bookings.visitorName })
          .from(bookings)
          .where(sql`${bookings.anonymisedAt} IS NULL`)
      ).map((b) => b.name),
    );
    const leftovers = await findAnywhere(
      needles.filter((s) => ![...live].some((l) => l.toLowerCase().includes(s.toLowerCase()))),
    );
    expect(leftovers).toEqual([]);
    for (const text of await exportsOf(demoGroupId)) for (const s of needles) expect(text).not.toContain(s);

    const settings = await as.organiser.get(`/api/groups/${demoGroupId}/settings`);
    expect(settings.json.retention).toMatchObject({ months: 1, lastRunAt: later.toISOString() });
    expect(settings.json.retention.lastRunAnonymised).toBeGreaterThanOrEqual(people.length);
  });

  it('refuses a retention period out of range with a 400', async () => {
    for (const months of [0, 121, 'soon', 1.5]) {
      const r = await as.organiser.send('PUT', `/api/groups/${demoGroupId}/settings`, { retentionMonths: months });
      expect(r.status, JSON.stringify(months)).toBe(400);
      expect(r.json.error.fields.retentionMonths).toBeTruthy();
    }
  });
});

describe('erasure and a copy of the booking', () => {
  let groupId: number;
  let slotId: number;
  let kettle: number;
  beforeAll(async () => {
    groupId = await makeGroup(db.db);
    ({
      slotIds: [slotId],
    } = await makeEvent(db.db, groupId, { capacity: 10 }));
    kettle = await categoryId(db.db, 'kettle');
  });
  const book = async (n: string) => {
    const visitor = { name: `Orla Quenby${n}`, email: `orla.quenby${n}@example.net`, phone: `07700 900${n}12` };
    const fault = `Stopped heating. Call ${visitor.phone} or ${visitor.email}, ask for Orla Quenby${n}.`;
    const r = await as.anon.post('/api/bookings', {
      slotId,
      visitor,
      items: [{ categoryId: kettle, fault }],
      consent: true,
    });
    expect(r.status, r.text).toBe(201);
    return { ...visitor, reference: r.json.reference as string, token: r.json.manageToken as string };
  };
  const pii = (v: { name: string; email: string; phone: string }) => [v.name, v.email, v.phone];

  it('gives the visitor everything held about the booking as a JSON download; a wrong token gets 404', async () => {
    const v = await book('301');
    const r = await as.anon.get(`/api/bookings/${v.reference}/personal-data?token=${v.token}`);
    expect(r.status).toBe(200);
    expect(r.headers.get('cache-control')).toBe('no-store');
    expect(r.headers.get('content-disposition')).toContain('attachment');
    expect(r.json.you).toMatchObject({ name: v.name, email: v.email, phone: v.phone });
    expect(r.json.items[0].fault).toContain('Stopped heating');
    expect(r.json.mails.length).toBeGreaterThanOrEqual(1);
    expect((await as.anon.get(`/api/bookings/${v.reference}/personal-data?token=x${v.token}`)).status).toBe(404);
    expect((await as.anon.get(`/api/bookings/${v.reference}/personal-data`)).status).toBe(404);
  });

  it('erases the visitor with the manage token: queued mail cancelled, nothing left, the record stays', async () => {
    const v = await book('302');
    // A mail still waiting to go (a reminder due later).
    await db.db.insert(outbox).values({
      toAddress: v.email,
      subject: `Reminder ${v.reference}`,
      html: 'x',
      text: `Your booking ${v.reference} is tomorrow.`,
      nextAttemptAt: new Date(Date.now() + 3600_000),
    });
    expect(await findAnywhere(pii(v))).not.toEqual([]);
    const r = await as.anon.delete(`/api/bookings/${v.reference}/personal-data?token=${v.token}`);
    expect(r.status, r.text).toBe(204);
    expect(
      await db.db
        .select()
        .from(outbox)
        .where(and(eq(outbox.toAddress, v.email), eq(outbox.status, 'pending'))),
    ).toEqual([]);
    expect(await findAnywhere(pii(v))).toEqual([]);
    const [b] = await db.db.select().from(bookings).where(eq(bookings.reference, v.reference));
    expect(b).toMatchObject({ status: 'confirmed', visitorName: 'Erased', visitorEmail: null, visitorPhone: null });
    const [i] = await db.db.select().from(bookingItems).where(eq(bookingItems.bookingId, b.id));
    expect(i.fault).toBe('Stopped heating. Call [number] or [e-mail], ask for [name].');
    // The link no longer opens anything.
    expect((await as.anon.get(`/api/bookings/${v.reference}?token=${v.token}`)).status).toBe(404);
  });

  it('lets an organiser of the group erase a booking; other callers get 404', async () => {
    const v = await book('303');
    const own = await makeUser(db.db, { roles: [[groupId, 'organiser']] });
    const other = await makeUser(db.db, { roles: [[demoGroupId, 'organiser']] });
    const fixer = await makeUser(db.db, { roles: [[groupId, 'fixer']] });
    for (const u of [other, fixer]) {
      const a = new Agent(server.url);
      await a.login(u.email, PASSWORD);
      expect((await a.delete(`/api/bookings/${v.reference}/personal-data`)).status).toBe(404);
    }
    expect((await as.anon.delete(`/api/bookings/${v.reference}/personal-data`)).status).toBe(404);
    const a = new Agent(server.url);
    await a.login(own.email, PASSWORD);
    expect((await a.delete(`/api/bookings/${v.reference}/personal-data`)).status).toBe(204);
    expect(await findAnywhere(pii(v))).toEqual([]);
  });
});

describe("a volunteer's account", () => {
  it('downloads its data, then closes: sign-in stops, name and address go, repair records stay', async () => {
    const [fixer] = await db.db.select().from(users).where(eq(users.email, 'fixer@example.org'));
    const recorded = await db.db.select().from(itemOutcomes).where(eq(itemOutcomes.recordedBy, fixer.id));
    const copy = await as.fixer.get('/api/me/personal-data');
    expect(copy.status).toBe(200);
    expect(copy.headers.get('content-disposition')).toContain('attachment');
    expect(copy.json.account).toMatchObject({ email: 'fixer@example.org', name: fixer.name });
    expect(copy.json.roles.length).toBeGreaterThan(0);
    expect((await as.anon.get('/api/me/personal-data')).status).toBe(401);

    const unconfirmed = await as.fixer.delete('/api/me/account');
    expect(unconfirmed.status).toBe(400);
    expect(unconfirmed.json.error.fields.confirm).toBeTruthy();
    expect((await as.fixer.send('DELETE', '/api/me/account', { confirm: true })).status).toBe(204);
    expect((await as.fixer.get('/api/auth/me')).json.user).toBeNull();
    expect(await findAnywhere(['fixer@example.org', fixer.name])).toEqual([]);
    expect((await new Agent(server.url).login('fixer@example.org', DEMO_PASSWORD)).status).toBe(401);
    expect(await db.db.select().from(itemOutcomes).where(eq(itemOutcomes.recordedBy, fixer.id))).toHaveLength(
      recorded.length,
    );
  });

  it('refuses to close the only administrator with a 409', async () => {
    const r = await as.admin.send('DELETE', '/api/me/account', { confirm: true });
    expect(r.status).toBe(409);
    expect(r.json.error.code).toBe('last-admin');
  });
});

describe('the privacy page', () => {
  it('is written from the group settings: how long, and who to contact', async () => {
    const put = await as.organiser.send('PUT', `/api/groups/${demoGroupId}/settings`, {
      retentionMonths: 18,
      contactEmail: 'privacy@kestlebridge.example.org',
    });
    expect(put.status).toBe(200);
    const r = await as.anon.get(`/api/public/groups/${demoGroupId}/privacy`);
    expect(r.status).toBe(200);
    const text = JSON.stringify(r.json.sections);
    expect(text).toContain('18 months after your session');
    expect(text).toContain('privacy@kestlebridge.example.org');
    expect((await as.anon.get('/api/public/groups/999999/privacy')).status).toBe(404);
    const bad = await as.organiser.send('PUT', `/api/groups/${demoGroupId}/settings`, {
      contactEmail: 'not an address',
    });
    expect(bad.status).toBe(400);
  });

  it('is written in the reader’s language, with the plural of each language (CLDR plural rules: one/other)', async () => {
    const notice = async (lang: string) => {
      const r = await new Agent(server.url, { 'accept-language': lang }).get(
        `/api/public/groups/${demoGroupId}/privacy`,
      );
      expect(r.status).toBe(200);
      expect(r.headers.get('vary') ?? '').toMatch(/accept-language/i);
      return r.json as { sections: { heading: string; paragraphs: string[] }[] };
    };
    const set = (retentionMonths: number) =>
      as.organiser.send('PUT', `/api/groups/${demoGroupId}/settings`, { retentionMonths });
    expect((await set(18)).status).toBe(200);
    const nl = await notice('nl-BE');
    expect(nl.sections[0].heading).toBe('Wat we bewaren');
    expect(JSON.stringify(nl)).toContain('18 maanden na je reparatiemoment');
    const de = await notice('de');
    expect(JSON.stringify(de)).toContain('18 Monate nach Ihrem Termin');
    expect(de.sections[4].paragraphs[0]).toContain('privacy@kestlebridge.example.org');
    expect((await set(1)).status).toBe(200);
    expect(JSON.stringify(await notice('fr'))).toContain('Un mois après votre atelier');
    expect(JSON.stringify(await notice('en'))).toContain('One month after your session');
  });
});
