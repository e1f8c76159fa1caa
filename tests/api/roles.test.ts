import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeGroup, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/**
 * Who may call what. Each row: a route, then the expected status for each kind of caller.
 * Later features add their rows here. `own` is the group the callers belong to; `other` is a second group.
 */
type Caller = 'anonymous' | 'account' | 'fixer' | 'host' | 'organiser' | 'otherOrganiser' | 'admin';
type Row = [
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE',
  path: (g: Groups) => string,
  expected: Record<Caller, number>,
  body?: unknown | ((g: Groups) => unknown),
];
interface Groups {
  own: number;
  other: number;
  pendingMembership: number;
  ownEvent: number;
  otherEvent: number;
  ownVenue: number;
}

const everyone = (status: number): Record<Caller, number> => ({
  anonymous: status,
  account: status,
  fixer: status,
  host: status,
  organiser: status,
  otherOrganiser: status,
  admin: status,
});
const signedIn = (status: number) => ({ ...everyone(status), anonymous: 401 });
const adminOnly = {
  anonymous: 401,
  account: 403,
  fixer: 403,
  host: 403,
  organiser: 403,
  otherOrganiser: 403,
  admin: 200,
};
const ownStaff = {
  anonymous: 401,
  account: 403,
  fixer: 403,
  host: 200,
  organiser: 200,
  otherOrganiser: 403,
  admin: 200,
};
const ownOrganiser = {
  anonymous: 401,
  account: 403,
  fixer: 403,
  host: 403,
  organiser: 200,
  otherOrganiser: 403,
  admin: 200,
};

const table: Row[] = [
  ['GET', () => '/api/health', everyone(200)],
  ['GET', () => '/api/public/config', everyone(200)],
  ['GET', () => '/api/public/groups', everyone(200)],
  // Signed out is not an error: anonymous gets 200 with `user: null` (issue 12).
  ['GET', () => '/api/auth/me', everyone(200)],
  ['GET', (g) => `/api/groups/${g.own}/members`, ownOrganiser],
  ['POST', (g) => `/api/groups/${g.own}/members/${g.pendingMembership}/approve`, ownOrganiser],
  ['GET', () => '/api/admin/mailbox', adminOnly],
  ['GET', () => '/api/admin/outbox', adminOnly],
  ['GET', () => '/api/admin/groups', adminOnly],
  ['GET', () => '/api/admin/users', adminOnly],
  ['POST', () => '/api/admin/groups', { ...adminOnly, admin: 400 }, { name: '' }],
  ['GET', () => '/api/categories', everyone(200)],
  ['GET', () => '/api/events', everyone(200)],
  ['GET', (g) => `/api/groups/${g.own}/settings`, everyone(200)],
  ['GET', (g) => `/api/venues?groupId=${g.own}`, ownOrganiser],
  // Validation comes after the role check: a permitted caller gets 400 for the empty body.
  ['POST', () => '/api/venues', { ...ownOrganiser, organiser: 400, admin: 400 }, (g: Groups) => ({ groupId: g.own })],
  ['POST', () => '/api/events', { ...ownOrganiser, organiser: 400, admin: 400 }, (g: Groups) => ({ groupId: g.own })],
  ['GET', (g) => `/api/events/${g.ownEvent}/bookings`, { ...ownOrganiser, host: 200 }],
  [
    'GET',
    (g) => `/api/groups/${g.own}/events`,
    { anonymous: 401, account: 403, fixer: 200, host: 200, organiser: 200, otherOrganiser: 200, admin: 200 },
  ],
  ['PATCH', (g) => `/api/events/${g.ownEvent}`, ownOrganiser, { description: 'Bring cake.' }],
  [
    'PATCH',
    (g) => `/api/events/${g.otherEvent}`,
    { ...ownOrganiser, organiser: 403, otherOrganiser: 200 },
    { description: 'Bring cake.' },
  ],
  ['PUT', (g) => `/api/groups/${g.own}/settings`, ownOrganiser, { houseRules: 'Be kind.', excludedCategoryIds: [] }],
  ['PATCH', () => '/api/categories/1', adminOnly, { repairMinutes: 30 }],
  ['GET', (g) => `/api/groups/${g.own}/skills`, ownOrganiser],
  ['GET', () => '/api/me/profile', signedIn(200)],
  ['GET', () => '/api/me/queue', signedIn(200)],
  ['GET', () => '/api/me/events', signedIn(200)],
  ['GET', () => '/api/me/shifts/calendar', signedIn(200)],
  ['GET', () => '/api/me/calendar-link', signedIn(200)],
  ['POST', () => '/api/me/calendar-link', signedIn(201)],
  ['DELETE', () => '/api/me/calendar-link', signedIn(204)],
  // The shift feed answers by its secret alone; an unknown one is not found for everyone.
  ['GET', () => `/api/public/shift-calendars/${'A'.repeat(43)}.ics`, everyone(404)],
  ['POST', (g) => `/api/events/${g.ownEvent}/triage`, { ...ownOrganiser, organiser: 201, admin: 201 }],
  ['GET', (g) => `/api/events/${g.ownEvent}/board`, ownOrganiser],
  ['GET', (g) => `/api/events/${g.ownEvent}/rota`, ownOrganiser],
  ['GET', (g) => `/api/events/${g.ownEvent}/benches`, { ...ownOrganiser, fixer: 200, host: 200, otherOrganiser: 200 }],
  ['GET', () => '/api/desk/events', signedIn(200)],
  ['GET', (g) => `/api/events/${g.ownEvent}/desk`, ownStaff],
  ['GET', (g) => `/api/events/${g.ownEvent}/live`, ownStaff],
  ['GET', (g) => `/api/events/${g.ownEvent}/tags`, ownStaff],
  ['POST', (g) => `/api/events/${g.ownEvent}/walk-ins`, { ...ownStaff, host: 400, organiser: 400, admin: 400 }],
  // No such booking or item: only an admin gets as far as the 404.
  ['POST', () => '/api/bookings/ZZZ-ZZZ/check-in', { ...everyone(403), anonymous: 401, admin: 404 }],
  ['GET', () => '/api/items/999999', { ...everyone(403), anonymous: 401, admin: 404 }],
  ['POST', () => '/api/items/999999/outcome', { ...everyone(403), anonymous: 401, admin: 400 }, {}],
  // The hall display shows published sessions only; this one is a draft.
  ['GET', (g) => `/api/public/events/${g.ownEvent}/queue`, everyone(404)],
  ['GET', () => '/api/public/tags/ZZZZZ', everyone(404)],
  ['GET', (g) => `/api/stats?groupId=${g.own}`, ownOrganiser],
  ['GET', (g) => `/api/stats?groupId=${g.other}`, { ...ownOrganiser, organiser: 403, otherOrganiser: 200 }],
  ['GET', () => '/api/stats', adminOnly],
  ['GET', (g) => `/api/stats/records?groupId=${g.own}`, ownOrganiser],
  ['GET', (g) => `/api/exports/open-repair-data.csv?groupId=${g.own}`, ownOrganiser],
  ['GET', (g) => `/api/exports/records.csv?groupId=${g.own}`, ownOrganiser],
  ['GET', (g) => `/api/events/${g.ownEvent}/report`, ownOrganiser],
  ['GET', (g) => `/api/groups/${g.own}/follow-ups`, ownOrganiser],
  ['GET', (g) => `/api/groups/${g.own}/report`, ownOrganiser],
  ['GET', (g) => `/api/groups/${g.own}/session-figures`, ownOrganiser],
  [
    'GET',
    () => '/api/knowledge',
    { anonymous: 401, account: 403, fixer: 200, host: 200, organiser: 200, otherOrganiser: 200, admin: 200 },
  ],
  ['GET', (g) => `/api/groups/${g.own}/salvage`, { ...ownStaff, fixer: 200, otherOrganiser: 200 }],
  [
    'POST',
    (g) => `/api/groups/${g.own}/salvage`,
    { ...ownStaff, fixer: 400, host: 403, organiser: 400, otherOrganiser: 400, admin: 400 },
    {},
  ],
  ['PUT', (g) => `/api/groups/${g.own}/knowledge-sharing`, ownOrganiser, { share: false }],
  ['GET', (g) => `/api/public/impact?groupId=${g.own}`, everyone(200)],
  ['GET', () => '/api/public/impact', everyone(200)],
  ['GET', () => '/api/public/bookings/ZZZ-ZZZ', everyone(404)],
  // The calendar file needs the booking's secret token, whoever asks.
  ['GET', () => '/api/bookings/ZZZ-ZZZ/calendar?token=nope', everyone(404)],
  ['GET', () => '/api/stats/method', everyone(200)],
  ['GET', () => '/api/admin/impact-settings', adminOnly],
  ['PUT', () => '/api/admin/impact-settings', { ...adminOnly, admin: 400 }, { displacement: 2 }],
  ['GET', () => '/api/rebook/1.nope', everyone(404)],
  [
    'POST',
    (g) => `/api/groups/${g.own}/invites`,
    { ...ownOrganiser, organiser: 202, admin: 202 },
    { email: 'invited@example.org', role: 'fixer' },
  ],
];

let db: TestDatabase;
let server: RunningServer;
let groups: Groups;
const agents = {} as Record<Caller, Agent>;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
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
  agents.anonymous = new Agent(server.url);
  for (const [caller, u] of Object.entries(people)) {
    agents[caller as Caller] = new Agent(server.url);
    expect((await agents[caller as Caller].login(u.email, u.password)).status).toBe(200);
  }
  const volunteer = await makeUser(db.db);
  const { memberships } = await import('../../server/src/db/schema/index');
  const [{ id }] = await db.db
    .insert(memberships)
    .values({ userId: volunteer.id, groupId: own, role: 'fixer', status: 'pending' })
    .$returningId();
  const { makeEvent } = await import('../support/factories');
  groups = {
    own,
    other,
    pendingMembership: id,
    ownEvent: (await makeEvent(db.db, own, { status: 'draft' })).eventId,
    otherEvent: (await makeEvent(db.db, other, { status: 'draft' })).eventId,
    ownVenue: 0,
  };
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

describe('routes × roles', () => {
  for (const [method, path, expected, body] of table) {
    it(`${method} ${path({ own: 1, other: 2, pendingMembership: 3, ownEvent: 4, otherEvent: 5, ownVenue: 6 }).replace(/\/\d+/g, '/:id')} answers ${JSON.stringify(expected)}`, async () => {
      const got: Record<string, number> = {};
      for (const caller of Object.keys(expected) as Caller[]) {
        const a = agents[caller];
        const url = path(groups);
        const payload = typeof body === 'function' ? body(groups) : (body ?? {});
        const res = method === 'GET' ? await a.get(url) : await a.send(method, url, payload);
        got[caller] = res.status;
      }
      expect(got).toEqual(expected);
    });
  }

  it('refuses to remove the last organiser of a group', async () => {
    const members = (await agents.organiser.get(`/api/groups/${groups.own}/members`)).json.members;
    const me = members.find((m: { role: string }) => m.role === 'organiser');
    const res = await agents.organiser.delete(`/api/groups/${groups.own}/members/${me.membershipId}`);
    expect(res.status).toBe(409);
    expect(res.json.error.code).toBe('last-organiser');
  });

  it('hides nothing behind the client alone: a fixer calling the organiser API directly is refused', async () => {
    const res = await agents.fixer.get(`/api/groups/${groups.own}/members`);
    expect(res.status).toBe(403);
    expect(res.json.error.code).toBe('forbidden');
  });
});
