import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { freePort } from '../../server/src/infra/mariadb';
import { LocalMailbox } from '../../server/src/mail/local-mailbox';
import { seedDemo } from '../../server/src/seed/demo';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from './db';
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
