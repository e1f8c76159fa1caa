import { randomBytes } from 'node:crypto';
import { eq, inArray } from 'drizzle-orm';
import { DEMO_PASSWORD } from '../../../shared/constants';
import { hashPassword, verifyPassword } from '../auth/passwords';
import type { Db } from '../db/client';
import { settings, users } from '../db/schema/index';
import { ensureCategories } from './categories';
import { DEMO_PEOPLE, isSeeded, markEmptyInstall, seedDemo } from './demo';

/** What a start does about the demo: the published password, a private one printed on the console, or nothing. */
export type DemoChoice = 'published' | 'private' | 'none';

export interface StartVariables {
  DEMO?: string;
  NODE_ENV?: string;
  DATABASE_URL?: string;
  PUBLIC_URL?: string;
}

/**
 * A start counts as production when it says so (NODE_ENV), uses a database of its own (DATABASE_URL) or serves a
 * public https address. Production loads the demo only when DEMO=1 asks for it, and never with the published password.
 */
export function demoChoice(v: StartVariables): DemoChoice {
  const production =
    v.NODE_ENV === 'production' || Boolean(v.DATABASE_URL) || Boolean(v.PUBLIC_URL?.startsWith('https://'));
  const asked = v.DEMO === '1' || v.DEMO === 'true';
  const refused = v.DEMO === '0' || v.DEMO === 'false';
  if (refused) return 'none';
  if (production) return asked ? 'private' : 'none';
  return 'published';
}

const DEMO_EMAILS = [...DEMO_PEOPLE.map((p) => p.email), 'juniper.oakes@example.org'];

/**
 * An installation seeded before production starts were guarded may still hold demo accounts with the published
 * password: a production start gives them a new private one.
 */
async function closePublishedDemo(db: Db, log: (line: string) => void): Promise<void> {
  const [demo] = await db.select().from(settings).where(eq(settings.key, 'demo'));
  if (demo?.value !== true) return;
  const password = randomBytes(12).toString('base64url');
  const passwordHash = await hashPassword(password);
  const rows = await db.select().from(users).where(inArray(users.email, DEMO_EMAILS));
  for (const u of rows)
    if (u.passwordHash && (await verifyPassword(u.passwordHash, DEMO_PASSWORD)))
      await db.update(users).set({ passwordHash }).where(eq(users.id, u.id));
  await db.update(settings).set({ value: 'private' }).where(eq(settings.key, 'demo'));
  log(`Production start: the demo accounts no longer take the published password. Their password now: ${password}`);
}

/** Runs before the server: categories, then the demo (or an empty installation) on the very first run. */
export async function prepareData(
  db: Db,
  v: StartVariables,
  opts: { linkSecret: string; log: (line: string) => void },
): Promise<DemoChoice> {
  await ensureCategories(db);
  const choice = demoChoice(v);
  if (await isSeeded(db)) {
    if (choice !== 'published') await closePublishedDemo(db, opts.log);
    return choice;
  }
  if (choice === 'none') {
    opts.log('Starting empty (no demo data): the first visit asks for the first admin and the setup code below');
    await markEmptyInstall(db);
  } else if (choice === 'private') {
    const password = randomBytes(12).toString('base64url');
    opts.log(`Loading the demo scenario (DEMO=1) with a private password for its accounts: ${password}`);
    await seedDemo(db, { linkSecret: opts.linkSecret, password });
  } else {
    opts.log('Loading the demo scenario (first run)');
    await seedDemo(db, { linkSecret: opts.linkSecret });
  }
  return choice;
}
