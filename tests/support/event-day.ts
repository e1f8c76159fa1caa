import { afterAll, beforeAll, expect } from 'vitest';
import { shifts, venueBenches, volunteerSkills } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from './db';
import { categoryId, makeEvent, makeGroup, makeUser, visitor } from './factories';
import { Agent } from './http';
import { startTestServer } from './server';

/*
 * The event-day API tests' shared scene: a group with a session that started 15 minutes ago at a venue with a
 * mains bench and a sewing table, its organiser, reception, two fixers (one on shift), a fixer and host of another
 * group, and the kinds of item the tests bring. Each test file that calls `useEventDay()` gets its own database.
 */

export let db: TestDatabase;
export let server: RunningServer;
export let groupId: number;
export let eventId: number;
export let slotIds: number[];
export const as: Record<'organiser' | 'host' | 'fixer' | 'fixer2' | 'outsider' | 'anon', Agent> = {} as never;
export const ids: Record<string, number> = {};
export let cats: Record<'kettle' | 'clothing' | 'lamp', number>;

/** Readings that pass for a Class I kettle with 1.5 m of cord (limits from EN 50678 via instrument manuals, REFERENCE.md §3). */
export const passing = {
  visual: { cord: true, plug: true, strainRelief: true, casing: true, noHeatDamage: true },
  applianceClass: 'I',
  heating: true,
  cordLengthM: 1.5,
  protectiveConductorOhm: 0.12,
  insulationMOhm: 45,
  instrument: 'PAT tester, bench 1',
};

export async function book(slot: number, items: { categoryId: number; fault: string }[], who = visitor()) {
  const r = await as.anon.post('/api/bookings', { slotId: slot, visitor: who, items, consent: true });
  expect(r.status).toBe(201);
  return { reference: r.json.reference as string, who };
}

export function useEventDay() {
  beforeAll(async () => {
    db = await createTestDatabase();
    server = await startTestServer(db.url);
    groupId = await makeGroup(db.db);
    const other = await makeGroup(db.db);
    // The session started 15 minutes ago: its first slot is still open for bookings, the desk is open.
    const ev = await makeEvent(db.db, groupId, {
      startsAt: new Date(Date.now() - 15 * 60_000),
      slotCount: 4,
      capacity: 6,
    });
    eventId = ev.eventId;
    slotIds = ev.slotIds;
    await db.db.insert(venueBenches).values([
      {
        venueId: ev.venueId,
        name: 'Mains bench',
        seats: 2,
        equipment: ['multimeter', 'appliance-safety-tester', 'soldering-station'],
        position: 0,
      },
      { venueId: ev.venueId, name: 'Sewing table', seats: 1, equipment: ['sewing-machine'], position: 1 },
    ]);
    const users = {
      organiser: await makeUser(db.db, { roles: [[groupId, 'organiser']] }),
      host: await makeUser(db.db, { roles: [[groupId, 'host']] }),
      fixer: await makeUser(db.db, { roles: [[groupId, 'fixer']] }),
      fixer2: await makeUser(db.db, { roles: [[groupId, 'fixer']] }),
      outsider: await makeUser(db.db, {
        roles: [
          [other, 'fixer'],
          [other, 'host'],
        ],
      }),
    };
    for (const [k, u] of Object.entries(users)) {
      ids[k] = u.id;
      as[k as keyof typeof as] = new Agent(server.url);
      expect((await as[k as keyof typeof as].login(u.email, u.password)).status).toBe(200);
    }
    as.anon = new Agent(server.url);
    await db.db.insert(volunteerSkills).values([
      { userId: ids.fixer, skill: 'electrical', level: 3 },
      { userId: ids.fixer, skill: 'textiles', level: 2 },
      { userId: ids.fixer2, skill: 'electrical', level: 2 },
    ]);
    const end = new Date(Date.now() + 4 * 3600_000);
    await db.db
      .insert(shifts)
      .values([{ eventId, userId: ids.fixer, coming: true, startsAt: new Date(Date.now() - 3600_000), endsAt: end }]);
    cats = {
      kettle: await categoryId(db.db, 'kettle'),
      clothing: await categoryId(db.db, 'clothing'),
      lamp: await categoryId(db.db, 'lamp'),
    };
  });
  afterAll(async () => {
    await server.stop();
    await db.drop();
  });
}
