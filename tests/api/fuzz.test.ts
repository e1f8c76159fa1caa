import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { rawCase, weirdBody, weirdQuery, weirdSegment, type RawCase } from '../support/fuzz';
import type { Agent } from '../support/http';
import { setUpCallers, type Caller, type Fixtures } from '../support/roles';
import { listRoutes } from '../support/routes';
import { startTestServer } from '../support/server';

/**
 * Issue 14's fuzz test: at least 10,000 malformed requests from fixed seeds across every API route the app answers
 * (read from its routers), as an anonymous visitor, an organiser and an admin. Nothing may answer 5xx, no answer may
 * carry a stack trace, and the server's log must hold none.
 */
const SEEDS = [20261204, 14, 1_000_003];
const PER_SEED = 3_400;
const AT_ONCE = 24;
/** Routes that would end the caller's sign-in; signed-in callers leave them to the anonymous one. */
const SIGNS_OUT = /^POST \/api\/auth\/logout$|^DELETE \/api\/me(\/account)?$/;
const STACK = /\n\s+at |node_modules\/|\.ts:\d+:\d+/;

let db: TestDatabase;
let server: RunningServer;
let fixtures: Fixtures;
let agents: Record<Caller, Agent>;
const log: string[] = [];

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url, { TRUST_PROXY: '1' }, { log: (l) => log.push(l) });
  ({ agents, fixtures } = await setUpCallers(db, server));
  for (const a of Object.values(agents)) await a.token();
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

/** Ids that exist, by parameter name, so that a request often gets past "not found" to the checks behind it. */
function goodValues(route: string, name: string): string[] {
  const f = fixtures;
  const p = route.split(' ')[1];
  if (name === 'groupId') return [String(f.own)];
  if (name === 'reference') return [f.reference];
  if (name === 'itemId') return [String(f.item)];
  if (name === 'slotId') return [String(f.ownSlot)];
  if (name === 'venueId') return [String(f.ownVenue)];
  if (name === 'membershipId') return [String(f.pendingMembership)];
  if (name !== 'id') return [];
  if (p.startsWith('/api/events/')) return [String(f.liveEvent), String(f.ownEvent)];
  if (p.startsWith('/api/items/')) return [String(f.item)];
  if (p.startsWith('/api/salvage/')) return [String(f.salvage)];
  if (p.startsWith('/api/categories/')) return ['1'];
  return [];
}

interface Case {
  route: string;
  caller: Caller;
  segments: (string | null)[];
  query: string | null;
  withToken: boolean;
  body: string | RawCase;
  ip: number;
}

const caseOf = (routes: string[]): fc.Arbitrary<Case> =>
  fc.record({
    route: fc.constantFrom(...routes),
    caller: fc.constantFrom<Caller>('anonymous', 'organiser', 'admin', 'fixer'),
    segments: fc.array(fc.option(weirdSegment, { freq: 3 }), { minLength: 4, maxLength: 4 }),
    query: fc.option(weirdQuery, { freq: 2 }),
    withToken: fc.boolean(),
    body: fc.oneof({ weight: 4, arbitrary: weirdBody }, { weight: 1, arbitrary: rawCase }),
    ip: fc.integer({ min: 1, max: 60_000 }),
  });

async function send(c: Case) {
  const [method, pattern] = c.route.split(' ');
  const caller = method !== 'GET' && SIGNS_OUT.test(c.route) ? 'anonymous' : c.caller;
  let n = 0;
  const url = pattern.replace(/:(\w+)/g, (_m, name: string) => {
    const good = goodValues(c.route, name);
    const weird = c.segments[n++ % c.segments.length];
    return weird === null && good.length ? good[n % good.length] : (weird ?? '%ff');
  });
  const query = [c.withToken ? `token=${fixtures.manageToken}` : '', c.query ?? ''].filter(Boolean).join('&');
  const agent = agents[caller];
  const headers: Record<string, string> = {
    accept: 'application/json',
    'x-forwarded-for': `10.${c.ip >> 8}.${c.ip & 255}.7`,
    'x-csrf-token': agent.csrf ?? '',
  };
  if (agent.cookies.size) headers.cookie = agent.cookieHeader();
  let body: string | Blob | undefined;
  if (method !== 'GET') {
    if (typeof c.body === 'string') {
      headers['content-type'] = 'application/json';
      body = c.body;
    } else {
      headers['content-type'] = c.body.contentType;
      if (c.body.encoding) headers['content-encoding'] = c.body.encoding;
      body = typeof c.body.body === 'string' ? c.body.body : new Blob([new Uint8Array(c.body.body)]);
    }
  }
  const target = `${server.url}${url}${query ? `?${query}` : ''}`;
  const res = await fetch(target, { method, headers, body, redirect: 'manual' });
  const text = await res.text();
  return { status: res.status, text, what: `${method} ${url.slice(0, 120)}${query ? '?…' : ''}` };
}

describe('fuzz: malformed requests on every route', () => {
  it(`answers ${SEEDS.length * PER_SEED} malformed requests with no 5xx and no stack trace`, async () => {
    const routes = listRoutes(server.server);
    expect(routes.length).toBeGreaterThan(100);
    const statuses = new Map<number, number>();
    // One example per route, so that a single fault does not hide the others.
    const failures = new Map<string, string>();
    const routesHit = new Set<string>();
    for (const seed of SEEDS) {
      const cases = fc.sample(caseOf(routes), { seed, numRuns: PER_SEED });
      for (let i = 0; i < cases.length; i += AT_ONCE) {
        const batch = cases.slice(i, i + AT_ONCE);
        const answers = await Promise.all(batch.map(send));
        answers.forEach((a, j) => {
          statuses.set(a.status, (statuses.get(a.status) ?? 0) + 1);
          routesHit.add(batch[j].route);
          if (a.status >= 500 || STACK.test(a.text))
            if (!failures.has(batch[j].route))
              failures.set(batch[j].route, `seed ${seed} #${i + j}: ${a.what} → ${a.status} ${a.text.slice(0, 160)}`);
        });
      }
    }
    const summary = [...statuses].sort(([a], [b]) => a - b).map(([s, n]) => `${s}: ${n}`);
    console.log(`fuzz: ${SEEDS.length * PER_SEED} requests over ${routesHit.size} routes; ${summary.join(', ')}`);
    expect([...failures.values()]).toEqual([]);
    expect(routesHit.size).toBe(routes.length);
    // The requests reach the checks behind the role check: many are refused as invalid, not only as forbidden.
    const invalid =
      (statuses.get(400) ?? 0) + (statuses.get(409) ?? 0) + (statuses.get(413) ?? 0) + (statuses.get(415) ?? 0);
    expect(invalid).toBeGreaterThan(SEEDS.length * PER_SEED * 0.3);
    expect(log.filter((l) => STACK.test(l)).slice(0, 5)).toEqual([]);
    // The signed-in callers are still signed in: the fuzz did not quietly turn into 10,000 anonymous requests.
    expect((await agents.admin.get('/api/auth/me')).json.user).not.toBeNull();
  }, 600_000);
});
