import { eq, sql } from 'drizzle-orm';
import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bookingItems, bookings, events, followUps, outbox, slots } from '../../server/src/db/schema/index';
import { ORDS_FIELDS } from '../../shared/impact/open-repair-data';
import { sendFollowUpReminders } from '../../server/src/features/impact/follow-ups';
import { sendThankYous } from '../../server/src/features/impact/thanks';
import { TODAY_TITLE } from '../../server/src/seed/demo-today';
import type { RunningServer } from '../../server/src/server';
import { type TestDatabase } from '../support/db';
import { Agent } from '../support/http';
import { startDemoApi, type DemoApi } from '../support/demo-app';

let db: TestDatabase;
let app: DemoApi;
let server: RunningServer;
let groupId: number;
let todayId: number;
const as: Record<string, Agent> = {};

beforeAll(async () => {
  app = await startDemoApi();
  ({ db, server, groupId } = app);
  const [t] = await db.db.select().from(events).where(eq(events.title, TODAY_TITLE));
  todayId = t.id;
  for (const who of ['organiser', 'fixer', 'host', 'admin']) as[who] = await app.signIn(who);
  as.anon = new Agent(server.url);
});
afterAll(() => app.stop());

/**
 * The same figures counted straight from the records, without the rollup: items that reached the desk, not
 * superseded by a later arrived visit; masses weighed or the category average; d from the settings (default 0.5).
 */
async function direct(where: ReturnType<typeof sql>) {
  const [r] = (await db.db.execute(sql`
    SELECT COUNT(*) AS items,
      SUM(o.outcome = 'fixed') AS fixed, SUM(o.outcome = 'parts-needed') AS parts, SUM(o.outcome = 'advice') AS advice, SUM(o.outcome = 'end-of-life') AS eol,
      SUM(CASE WHEN o.outcome = 'fixed' THEN COALESCE(bi.weighed_kg, c.avg_weight_kg) ELSE 0 END) AS kg,
      SUM(CASE WHEN o.outcome = 'fixed' THEN COALESCE(bi.weighed_kg, c.avg_weight_kg) * COALESCE(c.co2e_per_kg, 0) ELSE 0 END) * 0.5 AS co2e
    FROM booking_items bi JOIN bookings b ON b.id = bi.booking_id JOIN events e ON e.id = b.event_id JOIN categories c ON c.id = bi.category_id
    LEFT JOIN item_outcomes o ON o.item_id = bi.id
    WHERE b.status = 'confirmed' AND bi.checked_in_at IS NOT NULL AND bi.status NOT IN ('no-show', 'withdrawn')
      AND NOT EXISTS (SELECT 1 FROM booking_items r JOIN bookings rb ON rb.id = r.booking_id WHERE r.return_of_item_id = bi.id AND rb.status = 'confirmed' AND r.checked_in_at IS NOT NULL AND r.status NOT IN ('no-show', 'withdrawn'))
      AND ${where}`)) as unknown as [Record<string, string>[]];
  const row = r[0];
  return {
    items: Number(row.items),
    fixed: Number(row.fixed),
    partsNeeded: Number(row.parts),
    advice: Number(row.advice),
    endOfLife: Number(row.eol),
    kg: Number(row.kg),
    co2e: Number(row.co2e),
  };
}

describe('statistics', () => {
  it('match a direct count of the seeded records, for a group, an event and the whole network', async () => {
    for (const [url, where] of [
      [`/api/stats?groupId=${groupId}`, sql`e.group_id = ${groupId}`],
      [`/api/stats?eventId=${todayId}`, sql`e.id = ${todayId}`],
      ['/api/stats', sql`1 = 1`],
    ] as const) {
      const s = (await (url === '/api/stats' ? as.admin : as.organiser).get(url)).json;
      const d = await direct(where);
      expect(s).toMatchObject({
        items: d.items,
        fixed: d.fixed,
        partsNeeded: d.partsNeeded,
        advice: d.advice,
        endOfLife: d.endOfLife,
      });
      expect(s.kgDiverted).toBeCloseTo(d.kg, 3);
      expect(s.co2eKg).toBeCloseTo(d.co2e, 3);
      expect(s.byCategory.reduce((n: number, c: { items: number }) => n + c.items, 0)).toBe(d.items);
    }
    const year = (await as.organiser.get(`/api/stats?groupId=${groupId}&from=2000-01-01&to=2000-12-31`)).json;
    expect(year.items).toBe(0);
    expect(year.fixRate).toBeNull();
  });

  it('follow an outcome as soon as it is recorded', async () => {
    const before = (await as.organiser.get(`/api/stats?eventId=${todayId}`)).json;
    const [toaster] = await db.db
      .select({ id: bookingItems.id })
      .from(bookingItems)
      .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
      .where(eq(bookings.reference, 'T4M-8RS'));
    const r = await as.organiser.post(`/api/items/${toaster.id}/outcome`, {
      outcome: 'end-of-life',
      barrier: 'spare-parts-not-available',
    });
    expect(r.status).toBe(200);
    const after = (await as.organiser.get(`/api/stats?eventId=${todayId}`)).json;
    expect(after.endOfLife).toBe(before.endOfLife + 1);
    expect(after.barriers).toContainEqual({ barrier: 'spare-parts-not-available', count: expect.any(Number) });
  });

  it('are for the group’s organisers; the network for admins only', async () => {
    expect((await as.fixer.get(`/api/stats?groupId=${groupId}`)).status).toBe(403);
    expect((await as.host.get(`/api/stats?eventId=${todayId}`)).status).toBe(403);
    expect((await as.organiser.get('/api/stats')).status).toBe(403);
    expect((await as.anon.get(`/api/stats?groupId=${groupId}`)).status).toBe(401);
    expect((await as.organiser.get(`/api/stats?groupId=${groupId}&from=2026-05-01&to=2026-01-01`)).status).toBe(400);
  });
});

describe('the report for a period', () => {
  it('adds up the sessions between two dates with the volunteers’ hours, matching the statistics', async () => {
    const from = new Date(Date.now() - 200 * 86400_000).toISOString().slice(0, 10);
    const to = new Date(Date.now() - 20 * 86400_000).toISOString().slice(0, 10);
    const r = await as.organiser.get(`/api/groups/${groupId}/report?from=${from}&to=${to}`);
    expect(r.status).toBe(200);
    const s = (await as.organiser.get(`/api/stats?groupId=${groupId}&from=${from}&to=${to}`)).json;
    expect(r.json.stats).toMatchObject({ items: s.items, fixed: s.fixed, kgDiverted: s.kgDiverted });
    const [{ n }] = (
      (await db.db.execute(
        sql`SELECT COUNT(*) AS n FROM events WHERE group_id = ${groupId} AND status IN ('published','closed') AND starts_at <= NOW(3) AND DATE(starts_at) BETWEEN ${from} AND ${to}`,
      )) as unknown as [{ n: number }[]]
    )[0];
    expect(r.json.range.sessions).toBe(Number(n));
    // Five volunteers, three hours at each monthly session.
    expect(r.json.volunteerHours).toBe(Number(n) * 5 * 3);
    expect((await as.fixer.get(`/api/groups/${groupId}/report`)).status).toBe(403);
  });
});

describe('the public impact page', () => {
  it('shows the totals and the method, and no visitor’s name or address', async () => {
    const r = await as.anon.get(`/api/public/impact?groupId=${groupId}`);
    expect(r.status).toBe(200);
    const s = (await as.organiser.get(`/api/stats?groupId=${groupId}`)).json;
    expect(r.json).toMatchObject({ items: s.items, fixed: s.fixed, kgDiverted: s.kgDiverted });
    expect(r.json.method.text.length).toBeGreaterThan(2);
    const names = await db.db.select({ name: bookings.visitorName, email: bookings.visitorEmail }).from(bookings);
    for (const n of names) {
      expect(r.text).not.toContain(n.name);
      if (n.email) expect(r.text).not.toContain(n.email);
    }
    expect(r.text).not.toMatch(/@example\.org/);
    expect(r.headers.get('set-cookie')).toBeNull();
  });
});

describe('exports', () => {
  it('use the Open Repair Data Standard’s field names and status values (REFERENCE.md §5)', async () => {
    const r = await as.organiser.get(`/api/exports/open-repair-data.csv?groupId=${groupId}`);
    expect(r.status).toBe(200);
    expect(r.headers.get('content-type')).toMatch(/text\/csv/);
    const lines = r.text.trim().split('\n');
    expect(lines[0].split(',')).toEqual([...ORDS_FIELDS]);
    for (const f of [
      'product_category',
      'brand',
      'year_of_manufacture',
      'problem',
      'repair_status',
      'repair_barrier_if_end_of_life',
      'group_identifier',
      'event_date',
    ])
      expect(lines[0].split(',')).toContain(f);
    const rows = parse(r.text, { columns: true }) as Record<string, string>[];
    expect(rows.length).toBeGreaterThan(50);
    expect(new Set(rows.map((x) => x.repair_status))).toEqual(
      new Set(['Fixed', 'Repairable', 'End of life', 'Unknown']),
    );
    const barriers = new Set(rows.map((x) => x.repair_barrier_if_end_of_life).filter(Boolean));
    for (const b of barriers)
      expect([
        'Spare parts not available',
        'Spare parts too expensive',
        'No way to open product',
        'Repair information not available',
        'Lack of equipment',
        'Item too worn out',
      ]).toContain(b);
    expect(rows.every((x) => /^\d{4}-\d{2}-\d{2}$/.test(x.event_date))).toBe(true);
    expect(r.text).not.toMatch(/@example\.org/);
    expect((await as.fixer.get(`/api/exports/open-repair-data.csv?groupId=${groupId}`)).status).toBe(403);
  });

  it('writes the codelist’s own texts for each stored reason, while the screens use other words', async () => {
    // Source: REFERENCE.md §5, ORDS v0.3 repair_barrier_if_end_of_life codelist, codes 1–6 in order.
    const codelist: Record<string, string> = {
      'spare-parts-not-available': 'Spare parts not available',
      'spare-parts-too-expensive': 'Spare parts too expensive',
      'no-way-to-open': 'No way to open product',
      'repair-information-not-available': 'Repair information not available',
      'lack-of-equipment': 'Lack of equipment',
      'too-worn-out': 'Item too worn out',
    };
    const r = await as.organiser.get(`/api/exports/open-repair-data.csv?groupId=${groupId}`);
    const rows = parse(r.text, { columns: true }) as Record<string, string>[];
    const stored = (await db.db.execute(sql`SELECT item_id AS id, outcome, barrier FROM item_outcomes`)) as unknown as [
      { id: number; outcome: string; barrier: string | null }[],
    ];
    const byId = new Map(stored[0].map((o) => [`mendery-${o.id}`, o]));
    let checked = 0;
    for (const row of rows) {
      const o = byId.get(row.id);
      if (o?.outcome === 'end-of-life' && o.barrier) {
        expect(row.repair_status).toBe('End of life');
        expect(row.repair_barrier_if_end_of_life).toBe(codelist[o.barrier]);
        checked++;
      } else expect(row.repair_barrier_if_end_of_life).toBe('');
    }
    expect(checked).toBeGreaterThan(0);
    // Mendery's own file and screens keep their own words.
    const own = await as.organiser.get(`/api/exports/records.csv?groupId=${groupId}`);
    expect(own.text).not.toMatch(/End of life|Spare parts|No way to open/);
    expect(own.text).toMatch(/Beyond mending/);
  });
});

describe('parts-needed follow-up', () => {
  it('mails the visitor the part and a re-booking link that books with priority, even into a full slot, and counts the item once', async () => {
    const [lamp] = await db.db
      .select({ id: bookingItems.id, eventId: bookings.eventId })
      .from(bookingItems)
      .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
      .where(eq(bookings.reference, 'T6P-2XC'));
    await as.host.post('/api/bookings/T6P-2XC/check-in', {});
    await as.organiser.post(`/api/items/${lamp.id}/start`, {});
    const r = await as.organiser.post(`/api/items/${lamp.id}/outcome`, {
      outcome: 'parts-needed',
      part: { description: 'E27 lampholder with cord grip', cost: 4.2 },
    });
    expect(r.status).toBe(200);
    const [f] = await db.db.select().from(followUps).where(eq(followUps.itemId, lamp.id));
    expect(f).toMatchObject({ status: 'open' });
    expect(f.mailedAt).not.toBeNull();
    const mails = await db.db.select().from(outbox).where(eq(outbox.toAddress, 'cass@example.org'));
    const mail = mails.find((m) => m.subject.includes('part'))!;
    expect(mail.text).toContain('E27 lampholder with cord grip');
    const link = /\/rebook\/([\w.-]+)/.exec(mail.text)![1];

    const view = (await as.anon.get(`/api/rebook/${link}`)).json;
    expect(view.item.part).toBe('E27 lampholder with cord grip');
    const next = view.events[0];
    const slotId = next.slots[0].id;
    // Fill the slot to its capacity: an ordinary booking is refused, the return visit is not.
    const [s] = await db.db.select().from(slots).where(eq(slots.id, slotId));
    await db.db.update(slots).set({ booked: s.capacity }).where(eq(slots.id, slotId));
    const ordinary = await as.anon.post('/api/bookings', {
      slotId,
      visitor: { name: 'Late Comer', email: 'late@example.org' },
      items: [{ categoryId: 1, fault: 'Something broke.' }],
      consent: true,
    });
    expect(ordinary.status).toBe(409);
    // The link books only its own group's sessions (issue 14, finding 5): another group's slot is refused, untouched.
    const [other] = (await db.db.execute(sql`
      SELECT s.id, s.booked FROM slots s JOIN events e ON e.id = s.event_id
       WHERE e.group_id <> ${groupId} AND e.status = 'published' AND s.starts_at > NOW() ORDER BY s.starts_at LIMIT 1`)) as unknown as [
      { id: number; booked: number }[],
    ];
    expect(other).toBeDefined();
    const foreign = await as.anon.post(`/api/rebook/${link}`, { slotId: other[0].id });
    expect(foreign.status).toBe(409);
    expect(foreign.json.error.code).toBe('not-offered');
    const [untouched] = await db.db.select().from(slots).where(eq(slots.id, other[0].id));
    expect(untouched.booked).toBe(other[0].booked);
    const back = await as.anon.post(`/api/rebook/${link}`, { slotId });
    expect(back.status).toBe(201);
    expect((await as.anon.post(`/api/rebook/${link}`, { slotId })).status).toBe(409);
    expect((await as.anon.get(`/api/rebook/${lamp.id}.forged`)).status).toBe(404);
    const [after] = await db.db.select().from(followUps).where(eq(followUps.itemId, lamp.id));
    expect(after.status).toBe('rebooked');
    const [ret] = await db.db.select().from(bookingItems).where(eq(bookingItems.id, after.returnItemId!));
    expect(ret.returnOfItemId).toBe(lamp.id);

    // The return visit is fixed at the later session: the item counts once, as fixed.
    const groupBefore = (await as.organiser.get(`/api/stats?groupId=${groupId}`)).json;
    await db.db
      .update(events)
      .set({ startsAt: new Date(Date.now() - 3600_000) })
      .where(eq(events.id, next.id));
    expect((await as.host.post(`/api/bookings/${back.json.reference}/check-in`, {})).status).toBe(200);
    expect((await db.db.select().from(followUps).where(eq(followUps.itemId, lamp.id)))[0].status).toBe('came-back');
    await as.organiser.post(`/api/items/${ret.id}/start`, {});
    const safety = {
      visual: { cord: true, plug: true, strainRelief: true, casing: true, noHeatDamage: true },
      applianceClass: 'II',
      insulationMOhm: 30,
    };
    expect((await as.organiser.post(`/api/items/${ret.id}/outcome`, { outcome: 'fixed', safety })).status).toBe(200);
    const groupAfter = (await as.organiser.get(`/api/stats?groupId=${groupId}`)).json;
    expect(groupAfter.items).toBe(groupBefore.items);
    expect(groupAfter.fixed).toBe(groupBefore.fixed + 1);
    expect(groupAfter.partsNeeded).toBe(groupBefore.partsNeeded - 1);
    expect((await db.db.select().from(followUps).where(eq(followUps.itemId, lamp.id)))[0].status).toBe(
      'fixed-at-return',
    );
    const list = (await as.organiser.get(`/api/groups/${groupId}/follow-ups`)).json;
    expect(list.find((x: { itemId: number }) => x.itemId === lamp.id)).toMatchObject({
      statusLabel: 'Fixed at return',
      rebookUrl: null,
      returnVisit: { reference: back.json.reference },
    });
    expect((await as.fixer.get(`/api/groups/${groupId}/follow-ups`)).status).toBe(403);
  });
});

describe('mails after the event', () => {
  it('thanks each visitor with what happened to their items and each volunteer with the totals, once', async () => {
    // Today's session ends; two hours later the thank-you mails go out.
    await db.db
      .update(events)
      .set({ endsAt: new Date(Date.now() - 3 * 3600_000) })
      .where(eq(events.id, todayId));
    // Cass booked in Dutch: her thank-you is Dutch, whoever's job sends it.
    await db.db.update(bookings).set({ language: 'nl' }).where(eq(bookings.reference, 'T6P-2XC'));
    const sent = await sendThankYous(server.ctx);
    expect(sent).toBeGreaterThanOrEqual(1);
    expect(await sendThankYous(server.ctx)).toBe(0);
    const sol = await db.db.select().from(outbox).where(eq(outbox.toAddress, 'sol@example.org'));
    const thanks = sol.find((m) => m.subject.startsWith('Thank you'))!;
    expect(thanks.text).toContain('Kettle: Fixed');
    // The weighed 1.1 kg kettle at 5.64795 kg CO2e per kg and d = 0.5: 3.1 kg CO2e.
    expect(thanks.text).toContain('about 1.1 kg out of the bin');
    expect(thanks.text).toContain('about 3.1 kg CO2e');
    const cass = (await db.db.select().from(outbox).where(eq(outbox.toAddress, 'cass@example.org'))).find((m) =>
      m.subject.startsWith('Bedankt voor je komst'),
    )!;
    expect(cass.text).toContain('Hallo Cass,');
    expect(cass.text).toContain(
      'Tafellamp of staande lamp: Onderdeel nodig (E27 lampholder with cord grip; we hebben je een link gestuurd om terug te komen).',
    );
    const wren = await db.db.select().from(outbox).where(eq(outbox.toAddress, 'wren.ashcombe@example.org'));
    expect(wren.some((m) => m.subject.includes('what we did together'))).toBe(true);
    // Someone who did not come gets no thank-you.
    expect(
      (await db.db.select().from(outbox).where(eq(outbox.toAddress, 'mae@example.org'))).some((m) =>
        m.subject.startsWith('Thank you'),
      ),
    ).toBe(false);
  });

  it('reminds a visitor whose part has been awaited six weeks, once', async () => {
    const due = await db.db
      .select()
      .from(followUps)
      .where(
        sql`${followUps.remindedAt} IS NULL AND ${followUps.createdAt} < NOW() - INTERVAL 42 DAY AND ${followUps.status} IN ('open','part-ordered')`,
      );
    expect(due.length).toBeGreaterThan(0);
    const n = await sendFollowUpReminders(server.ctx);
    expect(n).toBe(due.length);
    expect(await sendFollowUpReminders(server.ctx)).toBe(0);
  });
});

describe('return visits and skill limits', () => {
  it('lets a return visit past a slot’s per-skill limit, once', async () => {
    // A Kestlebridge session limits textiles to 2 a slot; fill a slot's textiles, then book a textile item's return.
    const [coat] = await db.db
      .select({ id: bookingItems.id })
      .from(bookingItems)
      .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
      .where(eq(bookings.reference, 'T3H-7PQ'));
    await as.organiser.post(`/api/items/${coat.id}/outcome`, {
      outcome: 'parts-needed',
      part: { description: 'Coat lining fabric, 0.5 m' },
    });
    const mail = (await db.db.select().from(outbox).where(eq(outbox.toAddress, 'ada@example.org'))).find((m) =>
      m.subject.includes('part'),
    )!;
    const link = /\/rebook\/([\w.-]+)/.exec(mail.text)![1];
    const view = (await as.anon.get(`/api/rebook/${link}`)).json;
    const target = view.events.find((e: { title: string }) => e.title === 'Kestlebridge repair session');
    const slotId = target.slots[target.slots.length - 1].id;
    await db.db.execute(
      sql`INSERT INTO slot_skill_counts (slot_id, skill, booked) VALUES (${slotId}, 'textiles', 2) ON DUPLICATE KEY UPDATE booked = 2`,
    );
    const r = await as.anon.post(`/api/rebook/${link}`, { slotId });
    expect(r.status).toBe(201);
  });
});

describe('a cancelled session', () => {
  it('counts nothing once cancelled, even after check-ins', async () => {
    // Today's Kestlebridge session has checked-in items and outcomes.
    const before = (await as.organiser.get(`/api/stats?eventId=${todayId}`)).json;
    expect(before.items).toBeGreaterThan(0);
    const c = await as.organiser.post(`/api/events/${todayId}/cancel`, { reason: 'Hall flooded.' });
    expect(c.status).toBeLessThan(300);
    expect((await as.organiser.get(`/api/stats?eventId=${todayId}`)).json.items).toBe(0);
  });
});
