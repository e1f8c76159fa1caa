import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mailboxMessages, outbox } from '../../server/src/db/schema/index';
import { freePort } from '../../server/src/infra/mariadb';
import { LocalMailbox } from '../../server/src/mail/local-mailbox';
import { enqueueMail, OutboxWorker } from '../../server/src/mail/outbox';
import { composeMail } from '../../server/src/mail/templates';
import { smtpSender } from '../../server/src/mail/transport';
import { createTestDatabase, type TestDatabase } from '../support/db';

let db: TestDatabase;
let port: number;
const senderFor = (p: number) =>
  smtpSender({
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: p,
    SMTP_SECURE: false,
    MAIL_FROM: 'Mendery <no-reply@mendery.test>',
  });

beforeAll(async () => {
  db = await createTestDatabase();
  port = await freePort();
});
afterAll(async () => {
  await db.drop();
});

describe('the outbox', () => {
  it('keeps a mail while the mailbox is down and delivers it once the mailbox is back', async () => {
    await db.db.transaction((tx) =>
      enqueueMail(tx, composeMail('wren@example.org', 'Your slot is booked', { paragraphs: ['See you on Saturday.'] })),
    );
    const worker = new OutboxWorker(db.db, senderFor(port));

    // The mailbox is down: the attempt fails, the row stays, and a retry is scheduled.
    expect(await worker.processBatch()).toBe(0);
    const [failed] = await db.db.select().from(outbox).where(eq(outbox.toAddress, 'wren@example.org'));
    expect(failed.status).toBe('pending');
    expect(failed.attempts).toBe(1);
    expect(failed.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(failed.nextAttemptAt.getTime()).toBeGreaterThan(Date.now() + 3000);
    // Not due yet: a pass now sends nothing and does not count an attempt.
    expect(await worker.processBatch()).toBe(0);

    const mailbox = new LocalMailbox(db.db, port);
    await mailbox.start();
    try {
      // The retry comes due (we move the clock of the row rather than sleep through the back-off).
      await db.db
        .update(outbox)
        .set({ nextAttemptAt: sql`NOW(3)` })
        .where(eq(outbox.id, failed.id));
      expect(await worker.processBatch()).toBe(1);
      const [row] = await db.db.select().from(outbox).where(eq(outbox.id, failed.id));
      expect(row).toMatchObject({ status: 'sent', attempts: 2, lastError: null });
      const caught = await db.db
        .select()
        .from(mailboxMessages)
        .where(eq(mailboxMessages.subject, 'Your slot is booked'));
      expect(caught).toHaveLength(1);
      expect(caught[0].toAddress).toBe('wren@example.org');
      expect(caught[0].text).toContain('See you on Saturday.');
      expect(caught[0].html).toContain('See you on Saturday.');
    } finally {
      await mailbox.stop();
    }
  });

  it('writes nothing when the transaction that caused the mail rolls back', async () => {
    await expect(
      db.db.transaction(async (tx) => {
        await enqueueMail(tx, composeMail('rollback@example.org', 'Never', { paragraphs: ['x'] }));
        throw new Error('the booking failed');
      }),
    ).rejects.toThrow('the booking failed');
    expect(await db.db.select().from(outbox).where(eq(outbox.toAddress, 'rollback@example.org'))).toHaveLength(0);
  });

  it('lets several workers share the queue without sending any mail twice', async () => {
    const sent: string[] = [];
    const slowSender = {
      send: async (m: { to: string }) => {
        await new Promise((r) => setTimeout(r, 5));
        sent.push(m.to);
      },
    };
    for (let i = 0; i < 60; i++)
      await enqueueMail(db.db, composeMail(`share-${i}@example.org`, 'Share', { paragraphs: [String(i)] }));
    const workers = [1, 2, 3, 4].map(() => new OutboxWorker(db.db, slowSender));
    const counts = await Promise.all(
      workers.map(async (w) => {
        let n = 0;
        for (let k = 0; k < 10; k++) n += await w.processBatch(5);
        return n;
      }),
    );
    const shared = sent.filter((t) => t.startsWith('share-'));
    expect(shared).toHaveLength(60);
    expect(new Set(shared).size).toBe(60);
    expect(counts.filter((c) => c > 0).length).toBeGreaterThan(1);
  });

  it('gives up at once on a permanent SMTP refusal and records why', async () => {
    const refusing = {
      send: async () => {
        throw Object.assign(new Error('550 mailbox unavailable'), { responseCode: 550 });
      },
    };
    await enqueueMail(db.db, composeMail('gone@example.org', 'Refused', { paragraphs: ['x'] }));
    await new OutboxWorker(db.db, refusing).processBatch();
    const [row] = await db.db.select().from(outbox).where(eq(outbox.toAddress, 'gone@example.org'));
    expect(row.status).toBe('failed');
    expect(row.lastError).toContain('550');
  });

  it('records a sent mail even when the database drops the first write of "sent", so it does not go twice', async () => {
    const sent: string[] = [];
    await enqueueMail(db.db, composeMail('once@example.org', 'Once', { paragraphs: ['x'] }));
    // The first UPDATE of the row to "sent" fails as a lost connection would; later ones go through.
    let failures = 1;
    const flaky = new Proxy(db.db, {
      get(target, prop, receiver) {
        if (prop === 'update' && failures > 0)
          return () => ({
            set: () => ({
              where: () => {
                failures--;
                return Promise.reject(
                  Object.assign(new Error('Connection lost'), { code: 'PROTOCOL_CONNECTION_LOST' }),
                );
              },
            }),
          });
        return Reflect.get(target, prop, receiver);
      },
    });
    const worker = new OutboxWorker(flaky, { send: async (m) => void sent.push(m.to) });
    expect(await worker.processBatch()).toBe(1);
    const [row] = await db.db.select().from(outbox).where(eq(outbox.toAddress, 'once@example.org'));
    expect(row.status).toBe('sent');
    expect(sent).toEqual(['once@example.org']);
  });

  it('the local mailbox keeps one copy of a mail sent again with the same Message-ID', async () => {
    const p = await freePort();
    const mailbox = new LocalMailbox(db.db, p);
    await mailbox.start();
    try {
      const send = senderFor(p);
      const mail = { to: 'twice@example.org', subject: 'Twice', html: '<p>x</p>', text: 'x' };
      await send.send({ ...mail, messageId: '<resend-1@mendery.test>' });
      await send.send({ ...mail, messageId: '<resend-1@mendery.test>' });
      await send.send({ ...mail, messageId: '<resend-2@mendery.test>' });
      const rows = await db.db.select().from(mailboxMessages).where(eq(mailboxMessages.toAddress, 'twice@example.org'));
      expect(rows.map((r) => r.messageId).sort()).toEqual(['<resend-1@mendery.test>', '<resend-2@mendery.test>']);
    } finally {
      await mailbox.stop();
    }
  });
});
