import { and, asc, eq, lte, sql } from 'drizzle-orm';
import { logReason } from '../db/log-reason';
import type { Db, DbOrTx } from '../db/client';
import { outbox } from '../db/schema/index';
import type { MailSender, OutgoingMail } from './transport';

/** Writes a mail to the outbox; call it with the transaction of the change that causes the mail. */
export async function enqueueMail(db: DbOrTx, mail: OutgoingMail): Promise<void> {
  await db.insert(outbox).values({
    toAddress: mail.to,
    subject: mail.subject,
    html: mail.html,
    text: mail.text,
    attachments: mail.attachments ?? null,
    nextAttemptAt: new Date(),
  });
}

export const MAX_ATTEMPTS = 34;
/** Seconds to wait after the n-th failure: 5 s doubling, at most an hour. */
export const backoffSeconds = (attempt: number): number => Math.min(3600, 5 * 2 ** Math.max(0, attempt - 1));
/** A claimed row not confirmed within this time (a worker that died) is claimed again. */
const LEASE_SECONDS = 120;

/** SMTP replies 5xx and bad addresses will not get better by retrying. */
function permanent(err: unknown): boolean {
  const e = err as { responseCode?: number; code?: string };
  return (e.responseCode !== undefined && e.responseCode >= 500) || e.code === 'EENVELOPE';
}

/** Runs a write again after a failure, backing off from 250 ms to 4 s, for up to about a minute (half the lease). */
async function untilWritten(write: () => Promise<unknown>) {
  for (let waited = 0, wait = 250; ; waited += wait, wait = Math.min(wait * 2, 4000)) {
    try {
      return await write();
    } catch (err) {
      if (waited >= (LEASE_SECONDS * 1000) / 2) throw err;
      await new Promise((r) => setTimeout(r, wait));
    }
  }
}

/**
 * Sends outbox rows. Rows are claimed with FOR UPDATE SKIP LOCKED and leased by moving next_attempt_at ahead,
 * so several workers in several processes share the work without sending a mail twice.
 */
export class OutboxWorker {
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<number> | null = null;
  private again = false;

  constructor(
    private db: Db,
    private sender: MailSender,
    private log: (line: string) => void = () => {},
  ) {}

  start(pollMs: number) {
    if (pollMs <= 0 || this.timer) return;
    this.timer = setInterval(() => void this.drain(), pollMs);
    this.timer.unref();
  }

  /** Asks for a pass soon (after a commit that queued mail); passes never overlap within one process. */
  kick() {
    void this.drain();
  }

  async drain(): Promise<number> {
    if (this.running) {
      this.again = true;
      return this.running;
    }
    this.running = (async () => {
      let total = 0;
      try {
        do {
          this.again = false;
          total += await this.processBatch();
        } while (this.again);
      } catch (err) {
        this.log(`outbox pass failed: ${logReason(err)}`);
      }
      return total;
    })().finally(() => (this.running = null));
    return this.running;
  }

  /** Claims and sends one batch; returns how many were sent. */
  async processBatch(limit = 20): Promise<number> {
    const claimed = await this.db.transaction(async (tx) => {
      const rows = await tx
        .select()
        .from(outbox)
        .where(and(eq(outbox.status, 'pending'), lte(outbox.nextAttemptAt, sql`NOW(3)`)))
        .orderBy(asc(outbox.id))
        .limit(limit)
        .for('update', { skipLocked: true });
      if (rows.length) {
        await tx
          .update(outbox)
          .set({ attempts: sql`${outbox.attempts} + 1`, nextAttemptAt: sql`NOW(3) + INTERVAL ${LEASE_SECONDS} SECOND` })
          .where(
            sql`${outbox.id} IN (${sql.join(
              rows.map((r) => sql`${r.id}`),
              sql`, `,
            )})`,
          );
      }
      return rows;
    });
    let sent = 0;
    for (const row of claimed) {
      const attempt = row.attempts + 1;
      try {
        await this.sender.send({
          to: row.toAddress,
          subject: row.subject,
          html: row.html,
          text: row.text,
          attachments: row.attachments ?? undefined,
          messageId: `<outbox-${row.id}-${row.createdAt.getTime()}@mendery.invalid>`,
        });
        // The mail is out: recording that must not be lost to a database that is away for a moment (a failover),
        // or the row's lease would run out and the mail go twice. Keep trying for well under the lease.
        await untilWritten(() =>
          this.db
            .update(outbox)
            .set({ status: 'sent', sentAt: new Date(), lastError: null })
            .where(eq(outbox.id, row.id)),
        );
        sent++;
      } catch (err) {
        const message = String((err as Error).message ?? err).slice(0, 500);
        const giveUp = permanent(err) || attempt >= MAX_ATTEMPTS;
        await this.db
          .update(outbox)
          .set({
            status: giveUp ? 'failed' : 'pending',
            lastError: message,
            nextAttemptAt: sql`NOW(3) + INTERVAL ${backoffSeconds(attempt)} SECOND`,
          })
          .where(eq(outbox.id, row.id));
        this.log(
          `mail #${row.id} to ${row.toAddress} ${giveUp ? 'failed for good' : `will be retried in ${backoffSeconds(attempt)} s`}: ${message}`,
        );
      }
    }
    return sent;
  }

  stop() {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    return this.running ?? Promise.resolve(0);
  }
}
