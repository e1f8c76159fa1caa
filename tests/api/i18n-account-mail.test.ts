import { readFileSync } from 'node:fs';
import { and, asc, eq, like } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../shared/constants';
import { events, outbox, repairGroups, users, volunteerSkills } from '../../server/src/db/schema/index';
import { makeUser } from '../support/factories';
import { DUTCH_GROUP, DUTCH_ORGANISER } from '../../server/src/seed/demo-dutch';
import { type TestDatabase } from '../support/db';
import { Agent } from '../support/http';
import { startDemoApi, type DemoApi } from '../support/demo-app';

/**
 * The mails about a volunteer's account and shifts in the reader's language: a sign-up in the language it was made
 * in; a password reset in the account's own language, whoever's browser asks; an invitation in the inviting group's
 * language; a request for a missing skill in the fixer's language. Expected words are our own catalogs'
 * (locales/<language>/mail.json).
 */
let db: TestDatabase;
let app: DemoApi;

beforeAll(async () => {
  app = await startDemoApi();
  ({ db } = app);
});
afterAll(() => app.stop());

const mailTo = async (to: string) =>
  (await db.db.select().from(outbox).where(eq(outbox.toAddress, to)).orderBy(asc(outbox.id))).at(-1)!;

describe('account mails in the reader’s language', () => {
  it('confirms a sign-up made in German in German', async () => {
    const email = `neu-${Date.now()}@example.org`;
    const res = await new Agent(app.server.url, { 'accept-language': 'de-DE,de;q=0.9' }).post('/api/auth/signup', {
      name: 'Greta Probst',
      email,
      password: 'long enough pw',
      groupId: app.groupId,
      role: 'fixer',
    });
    expect(res.status, res.text).toBe(202);
    const m = await mailTo(email);
    expect(m.subject).toBe('Bestätigen Sie Ihre E-Mail-Adresse für Mendery');
    expect(m.text).toContain('Hallo Greta Probst,');
    expect(m.text).toContain('Der Link gilt 48 Stunden.');
    expect(m.html).toContain('<html lang="de">');
  });

  it('sends a reset link in the account’s own language, though an English browser asked for it', async () => {
    await db.db.update(users).set({ language: 'fr' }).where(eq(users.email, 'host@example.org'));
    const res = await new Agent(app.server.url, { 'accept-language': 'en-GB' }).post('/api/auth/password-reset', {
      email: 'host@example.org',
    });
    expect(res.status, res.text).toBe(202);
    const m = await mailTo('host@example.org');
    expect(m.subject).toBe('Réinitialiser votre mot de passe Mendery');
    expect(m.text).toContain('Choisir un nouveau mot de passe');
  });

  it('invites a volunteer to the Dutch group in Dutch', async () => {
    const [g] = await db.db.select().from(repairGroups).where(eq(repairGroups.slug, DUTCH_GROUP.slug));
    const organiser = new Agent(app.server.url);
    expect((await organiser.login(DUTCH_ORGANISER.email, DEMO_PASSWORD)).status).toBe(200);
    const email = `uitnodiging-${Date.now()}@example.org`;
    const res = await organiser.post(`/api/groups/${g.id}/invites`, { email, role: 'fixer' });
    expect(res.status, res.text).toBeLessThan(300);
    const m = await mailTo(email);
    expect(m.subject).toBe(`${DUTCH_ORGANISER.name} nodigt je uit bij ${g.name}`);
    expect(m.text).toContain(`op Mendery te komen als reparateur.`);
    expect(m.text).toContain('De link werkt 14 dagen.');
  });

  it('asks a German-speaking fixer for a missing skill in German', async () => {
    const [e] = await db.db
      .select()
      .from(events)
      .where(and(eq(events.title, 'Kestlebridge repair session'), eq(events.status, 'published')))
      .orderBy(asc(events.startsAt));
    const organiser = await app.signIn('organiser');
    // A new fixer of the group who reads German, has a toys skill and has not said whether they come.
    const fixer = await makeUser(db.db, { roles: [[app.groupId, 'fixer']] });
    await db.db.update(users).set({ language: 'de' }).where(eq(users.id, fixer.id));
    await db.db.insert(volunteerSkills).values({ userId: fixer.id, skill: 'toys', level: 2 });
    const skill = 'toys';
    const res = await organiser.post(`/api/events/${e.id}/rota/ask`, { skills: [skill] });
    expect(res.status, res.text).toBe(200);
    expect(res.json.sent).toBeGreaterThan(0);
    const [mail] = await db.db
      .select()
      .from(outbox)
      .where(and(eq(outbox.toAddress, fixer.email), like(outbox.subject, `%${e.title}%`)));
    expect(mail.subject).toBe(`Können Sie bei ${e.title} helfen?`);
    // German keeps the skill's capital inside the sentence (locales/de/common.json names it).
    const name = JSON.parse(readFileSync('locales/de/common.json', 'utf8'))[`common.skill.${skill}`];
    expect(mail.text).toContain(`die ${name} brauchen`);
  });
});
