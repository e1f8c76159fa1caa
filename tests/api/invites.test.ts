import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeGroup, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { memorySender, startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
let groupId: number;
let organiser: Agent;
const mail = memorySender();

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url, {}, { sender: mail });
  groupId = await makeGroup(db.db);
  const o = await makeUser(db.db, { roles: [[groupId, 'organiser']] });
  organiser = new Agent(server.url);
  await organiser.login(o.email, o.password);
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

async function inviteToken(email: string, role = 'fixer') {
  expect((await organiser.post(`/api/groups/${groupId}/invites`, { email, role })).status).toBe(202);
  await server.ctx.outbox.drain();
  return /\/join\/([A-Za-z0-9_-]+)/.exec(mail.sent.filter((m) => m.to === email).at(-1)!.text)![1];
}

describe('inviting volunteers by e-mail', () => {
  it('lets a new person make their account from the link and join in the role, once', async () => {
    const token = await inviteToken('new.fixer@example.org');
    const view = await new Agent(server.url).get(`/api/invites/${token}`);
    expect(view.json).toMatchObject({ role: 'fixer', email: 'new.fixer@example.org', hasAccount: false });
    const a = new Agent(server.url);
    const made = await a.post(`/api/invites/${token}/signup`, { name: 'Noa Newfixer', password: 'a long new secret' });
    expect(made.status).toBe(201);
    expect(made.json.user.roles).toEqual([expect.objectContaining({ groupId, role: 'fixer' })]);
    expect((await new Agent(server.url).get(`/api/invites/${token}`)).status).toBe(404);
  });

  it('lets an existing account accept when signed in with the invited address, and no other', async () => {
    const u = await makeUser(db.db);
    const token = await inviteToken(u.email, 'host');
    const other = await makeUser(db.db);
    const wrong = new Agent(server.url);
    await wrong.login(other.email, other.password);
    expect((await wrong.post(`/api/invites/${token}/accept`)).status).toBe(403);
    const right = new Agent(server.url);
    await right.login(u.email, u.password);
    expect((await right.post(`/api/invites/${token}/accept`)).status).toBe(200);
    expect((await right.get('/api/auth/me')).json.user.roles).toEqual([
      expect.objectContaining({ groupId, role: 'host' }),
    ]);
  });

  it('lets only the group’s organisers send invitations', async () => {
    const f = await makeUser(db.db, { roles: [[groupId, 'fixer']] });
    const fixer = new Agent(server.url);
    await fixer.login(f.email, f.password);
    expect(
      (await fixer.post(`/api/groups/${groupId}/invites`, { email: 'x@example.org', role: 'organiser' })).status,
    ).toBe(403);
  });
});
