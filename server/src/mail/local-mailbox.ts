import { SMTPServer } from 'smtp-server';
import { logReason } from '../db/log-reason';
import { simpleParser, type AddressObject } from 'mailparser';
import { isDuplicate } from '../db/retry';
import type { Db } from '../db/client';
import { mailboxMessages } from '../db/schema/index';

const addresses = (a: AddressObject | AddressObject[] | undefined): string =>
  (Array.isArray(a) ? a : a ? [a] : []).map((x) => x.text).join(', ');

/**
 * A local SMTP server on loopback that keeps every message it receives, for development and the demo.
 * Inline images (cid:) are rewritten to data: URIs so the admin's mailbox view shows them.
 */
export class LocalMailbox {
  private server: SMTPServer | null = null;
  constructor(
    private db: Db,
    private port: number,
    private log: (l: string) => void = () => {},
  ) {}

  async start(): Promise<void> {
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      banner: 'Mendery local mailbox',
      size: 25 * 1024 * 1024,
      logger: false,
      onData: (stream, _session, callback) => {
        const chunks: Buffer[] = [];
        stream.on('data', (c: Buffer) => chunks.push(c));
        stream.on('end', async () => {
          try {
            const raw = Buffer.concat(chunks);
            const parsed = await simpleParser(raw);
            let html = typeof parsed.html === 'string' ? parsed.html : null;
            for (const att of parsed.attachments ?? []) {
              if (att.cid && html)
                html = html
                  .split(`cid:${att.cid}`)
                  .join(`data:${att.contentType};base64,${att.content.toString('base64')}`);
            }
            await this.db.insert(mailboxMessages).values({
              fromAddress: addresses(parsed.from).slice(0, 320),
              toAddress: addresses(parsed.to).slice(0, 1000),
              subject: (parsed.subject ?? '(no subject)').slice(0, 255),
              html,
              text: parsed.text ?? null,
              raw: raw.toString('utf8'),
              messageId: parsed.messageId?.slice(0, 255) ?? null,
            });
            callback();
          } catch (err) {
            // Stored by an earlier attempt whose answer did not reach the sender: accept it, keep one.
            if (isDuplicate(err)) return callback();
            this.log(`local mailbox could not store a message: ${logReason(err)}`);
            callback(Object.assign(new Error('Mailbox storage failed, try later'), { responseCode: 451 }));
          }
        });
      },
    });
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(this.port, '127.0.0.1', () => resolve());
    });
    this.server = server;
  }

  get listening() {
    return this.server !== null;
  }

  async stop(): Promise<void> {
    const s = this.server;
    this.server = null;
    if (s) await new Promise<void>((resolve) => s.close(() => resolve()));
  }
}
