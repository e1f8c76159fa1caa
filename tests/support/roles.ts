import { expect } from 'vitest';
import type { RunningServer } from '../../server/src/server';
import type { TestDatabase } from './db';
import { categoryId, makeEvent, makeGroup, makeUser, visitor } from './factories';
import { Agent } from './http';

/**
 * The role table's vocabulary. Each row: a route, then the expected status for each kind of caller.
 * `own` is the group the callers belong to; `other` is a second group.
 */
export type Caller = 'anonymous' | 'account' | 'fixer' | 'host' | 'organiser' | 'otherOrganiser' | 'admin';
export type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
export type Row = [
  method: Method,
  path: (g: Fixtures) => string,
  expected: Record<Caller, number>,
  body?: unknown | ((g: Fixtures) => unknown),
];
export interface Fixtures {
  own: number;
  other: number;
  pendingMembership: number;
  /** Drafts, one per group. */
  ownEvent: number;
  otherEvent: number;
  ownVenue: number;
  ownSlot: number;
  /** A published session of our group that started a quarter of an hour ago, with one booking of one item. */
  liveEvent: number;
  reference: string;
  manageToken: string;
  item: number;
  salvage: number;
}

export const everyone = (status: number): Record<Caller, number> => ({
  anonymous: status,
  account: status,
  fixer: status,
  host: status,
  organiser: status,
  otherOrganiser: status,
  admin: status,
});
export const signedIn = (status: number) => ({ ...everyone(status), anonymous: 401 });
export const adminOnly = { ...everyone(403), anonymous: 401, admin: 200 };
export const ownStaff = { ...adminOnly, host: 200, organiser: 200 };
export const ownOrganiser = { ...adminOnly, organiser: 200 };
/** Fixers, hosts and organisers of our group; `otherOrganiser` fixes in our group, so it counts. */
export const ownVolunteers = { ...ownStaff, fixer: 200, otherOrganiser: 200 };

/** A placeholder filled per case: the same fixtures, printed as `:id` in the test's title. */
export const TITLE_FIXTURES: Fixtures = {
  own: 1,
  other: 2,
  pendingMembership: 3,
  ownEvent: 4,
  otherEvent: 5,
  ownVenue: 6,
  ownSlot: 7,
  liveEvent: 8,
  reference: 'REF',
  manageToken: 'TOKEN',
  item: 9,
  salvage: 10,
};

/** Signs in one agent per caller and builds the groups, sessions, booking and part the rows point at. */
export async function setUpCallers(db: TestDatabase, server: RunningServer) {
  const own = await makeGroup(db.db);
  const other = await makeGroup(db.db);
  const people: Record<Exclude<Caller, 'anonymous'>, Awaited<ReturnType<typeof makeUser>>> = {
    account: await makeUser(db.db),
    fixer: await makeUser(db.db, { roles: [[own, 'fixer']] }),
    host: await makeUser(db.db, { roles: [[own, 'host']] }),
    organiser: await makeUser(db.db, { roles: [[own, 'organiser']] }),
    // Organises another group and fixes in ours: a role elsewhere grants nothing here.
    otherOrganiser: await makeUser(db.db, {
      roles: [
        [other, 'organiser'],
        [own, 'fixer'],
      ],
    }),
    admin: await makeUser(db.db, { admin: true }),
  };
  // Each caller comes from its own address (the server trusts one proxy hop), so per-address limits on the auth
  // routes count each caller's own requests, as they would in a hall full of phones.
  const from = (n: number) => ({ 'x-forwarded-for': `198.51.100.${n + 1}` });
  const agents = { anonymous: new Agent(server.url, from(0)) } as Record<Caller, Agent>;
  for (const [n, [caller, u]] of Object.entries(people).entries()) {
    agents[caller as Caller] = new Agent(server.url, from(n + 1));
    expect((await agents[caller as Caller].login(u.email, u.password)).status).toBe(200);
  }
  const volunteer = await makeUser(db.db);
  const { memberships } = await import('../../server/src/db/schema/index');
  const [{ id: pendingMembership }] = await db.db
    .insert(memberships)
    .values({ userId: volunteer.id, groupId: own, role: 'fixer', status: 'pending' })
    .$returningId();
  const draft = await makeEvent(db.db, own, { status: 'draft' });
  const live = await makeEvent(db.db, own, { startsAt: new Date(Date.now() - 15 * 60_000), capacity: 6 });
  const booked = await agents.anonymous.post('/api/bookings', {
    slotId: live.slotIds[0],
    visitor: visitor(),
    items: [{ categoryId: await categoryId(db.db, 'kettle'), fault: 'It clicks off at once.' }],
    consent: true,
  });
  expect(booked.status).toBe(201);
  const manageToken: string = booked.json.manageToken;
  const view = await agents.anonymous.get(`/api/bookings/${booked.json.reference}?token=${manageToken}`);
  expect(view.status).toBe(200);
  const part = await agents.organiser.post(`/api/groups/${own}/salvage`, {
    type: 'resistor',
    value: '10 kΩ',
    quantity: 5,
    box: 'Drawer 1',
  });
  expect(part.status).toBe(201);
  const fixtures: Fixtures = {
    own,
    other,
    pendingMembership,
    ownEvent: draft.eventId,
    otherEvent: (await makeEvent(db.db, other, { status: 'draft' })).eventId,
    ownVenue: draft.venueId,
    ownSlot: draft.slotIds[0],
    liveEvent: live.eventId,
    reference: booked.json.reference,
    manageToken,
    item: view.json.items[0].id,
    salvage: part.json.id,
  };
  return { agents, fixtures };
}
