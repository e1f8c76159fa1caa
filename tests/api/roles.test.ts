import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { match } from 'path-to-regexp';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import type { Agent } from '../support/http';
import { lastRows, moreRows } from '../support/role-rows';
import {
  adminOnly,
  everyone,
  ownOrganiser,
  ownStaff,
  setUpCallers,
  signedIn,
  TITLE_FIXTURES,
  type Caller,
  type Fixtures,
  type Row,
} from '../support/roles';
import { listRoutes } from '../support/routes';
import { startTestServer } from '../support/server';

/**
 * Who may call what, for every API route the app answers (the last test checks that no route is left out).
 * Rows and callers are defined in tests/support/roles.ts; more rows are in tests/support/role-rows.ts.
 */
const table: Row[] = [
  ['GET', () => '/api/health', everyone(200)],
  ['GET', () => '/api/live', everyone(200)],
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
  ['POST', () => '/api/venues', { ...ownOrganiser, organiser: 400, admin: 400 }, (g: Fixtures) => ({ groupId: g.own })],
  ['POST', () => '/api/events', { ...ownOrganiser, organiser: 400, admin: 400 }, (g: Fixtures) => ({ groupId: g.own })],
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
let groups: Fixtures;
let agents: Record<Caller, Agent>;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url, { TRUST_PROXY: '1' });
  ({ agents, fixtures: groups } = await setUpCallers(db, server));
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const titleOf = (method: string, path: Row[1]) =>
  `${method} ${path(TITLE_FIXTURES)
    .replace(/\/\d+/g, '/:id')
    .replace(/REF|TOKEN/g, ':$&')}`;

async function statuses([method, path, expected, body]: Row) {
  const got: Record<string, number> = {};
  for (const caller of Object.keys(expected) as Caller[]) {
    const a = agents[caller];
    const url = path(groups);
    const payload = typeof body === 'function' ? body(groups) : (body ?? {});
    const res = method === 'GET' ? await a.get(url) : await a.send(method, url, payload);
    got[caller] = res.status;
  }
  return got;
}

describe('routes × roles', () => {
  for (const row of [...table, ...moreRows]) {
    const [method, path, expected] = row;
    it(`${titleOf(method, path)} answers ${JSON.stringify(expected)}`, async () => {
      expect(await statuses(row)).toEqual(expected);
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

  it('has a row for every API route the app answers, and no row for a route it does not', async () => {
    const routes = listRoutes(server.server);
    expect(routes.length).toBeGreaterThan(100);
    const rows = [...table, ...moreRows, ...lastRows].map(([method, path]) => ({
      method,
      url: path(groups).split('?')[0],
    }));
    const matches = (route: string, row: { method: string; url: string }) => {
      const [method, pattern] = route.split(' ');
      return method === row.method && match(pattern, { decode: false })(row.url) !== false;
    };
    expect(routes.filter((r) => !rows.some((row) => matches(r, row)))).toEqual([]);
    expect(rows.filter((row) => !routes.some((r) => matches(r, row)))).toEqual([]);
  });

  for (const row of lastRows) {
    it(`${titleOf(row[0], row[1])} answers ${JSON.stringify(row[2])} (last: it signs everyone out)`, async () => {
      expect(await statuses(row)).toEqual(row[2]);
    });
  }
});
