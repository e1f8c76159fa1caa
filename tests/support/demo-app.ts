import { eq } from 'drizzle-orm';
import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { DEMO_PASSWORD } from '../../shared/constants';
import { repairGroups } from '../../server/src/db/schema/index';
import { freePort } from '../../server/src/infra/mariadb';
import { LocalMailbox } from '../../server/src/mail/local-mailbox';
import { seedDemo } from '../../server/src/seed/demo';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from './db';
import { Agent } from './http';
import { startTestServer, TEST_SECRET } from './server';

export interface DemoApp {
  db: TestDatabase;
  server: RunningServer;
  mailbox: LocalMailbox;
  dataDir: string;
  stop(): Promise<void>;
}

/** The app as `npm start` runs it: demo data, a real local mailbox on its own port, mail through SMTP. */
export async function startDemoApp(): Promise<DemoApp> {
  const db = await createTestDatabase();
  await seedDemo(db.db, { linkSecret: TEST_SECRET });
  const smtpPort = await freePort();
  const mailbox = new LocalMailbox(db.db, smtpPort);
  await mailbox.start();
  const dataDir = mkdtempSync(path.join(os.tmpdir(), 'mendery-e2e-'));
  const server = await startTestServer(
    db.url,
    { SMTP_PORT: String(smtpPort), OUTBOX_POLL_MS: '200', DATA_DIR: dataDir },
    { sender: 'smtp' },
  );
  return {
    db,
    server,
    mailbox,
    dataDir,
    async stop() {
      await server.stop();
      await mailbox.stop();
      await db.drop();
    },
  };
}

export interface DemoApi {
  db: TestDatabase;
  server: RunningServer;
  /** The id of the demo's main group, Kestlebridge Menders. */
  groupId: number;
  /** A new agent signed in as one of the demo accounts (`organiser`, `fixer`, `host`, `admin`). */
  signIn(who: string): Promise<Agent>;
  stop(): Promise<void>;
}

/** The API alone on the demo data, mail kept in memory: for tests that read the demo's records and files. */
export async function startDemoApi(): Promise<DemoApi> {
  const db = await createTestDatabase();
  await seedDemo(db.db, { linkSecret: TEST_SECRET });
  const server = await startTestServer(db.url);
  const [g] = await db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
  return {
    db,
    server,
    groupId: g.id,
    async signIn(who) {
      const agent = new Agent(server.url);
      const r = await agent.login(`${who}@example.org`, DEMO_PASSWORD);
      if (r.status !== 200) throw new Error(`demo sign-in as ${who} answered ${r.status}`);
      return agent;
    },
    async stop() {
      await server.stop();
      await db.drop();
    },
  };
}
