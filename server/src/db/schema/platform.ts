import { bigint, index, int, json, mediumtext, mysqlEnum, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, id, timestamp3 } from './columns';
import type { MailAttachment } from '../../mail/transport';

/** express-mysql-session's table, owned by our migrations (the store's own CREATE is switched off). */
export const sessions = mysqlTable(
  'sessions',
  {
    sessionId: varchar('session_id', { length: 128 }).primaryKey(),
    expires: int('expires', { unsigned: true }).notNull(),
    data: mediumtext('data'),
  },
  (t) => [index('sessions_expires_idx').on(t.expires)],
);

/** Counters for rate limits, shared by every app process. */
export const rateLimits = mysqlTable('rate_limits', {
  key: varchar('rate_key', { length: 191 }).primaryKey(),
  hits: int('hits', { unsigned: true }).notNull(),
  resetAt: timestamp3('reset_at').notNull(),
});

/** Mail waits here, written in the same transaction as the change that causes it, until a worker sends it. */
export const outbox = mysqlTable(
  'outbox',
  {
    id: id(),
    toAddress: varchar('to_address', { length: 254 }).notNull(),
    subject: varchar('subject', { length: 255 }).notNull(),
    html: mediumtext('html').notNull(),
    text: mediumtext('text').notNull(),
    attachments: json('attachments').$type<MailAttachment[]>(),
    status: mysqlEnum('status', ['pending', 'sent', 'failed']).notNull().default('pending'),
    attempts: int('attempts', { unsigned: true }).notNull().default(0),
    nextAttemptAt: timestamp3('next_attempt_at').notNull(),
    lastError: varchar('last_error', { length: 500 }),
    createdAt: createdAt(),
    sentAt: timestamp3('sent_at'),
  },
  (t) => [index('outbox_status_id_idx').on(t.status, t.id)],
);

/** What the local mailbox caught (development and demo only). */
export const mailboxMessages = mysqlTable('mailbox_messages', {
  id: id(),
  fromAddress: varchar('from_address', { length: 320 }).notNull(),
  toAddress: varchar('to_address', { length: 1000 }).notNull(),
  subject: varchar('subject', { length: 255 }).notNull(),
  html: mediumtext('html'),
  text: mediumtext('text'),
  raw: mediumtext('raw').notNull(),
  /** The sender's Message-ID: a resend of a mail already stored (its first answer was lost) is not stored again. */
  messageId: varchar('message_id', { length: 255 }).unique('mailbox_messages_message_id_unique'),
  receivedAt: createdAt(),
});

export const settings = mysqlTable('settings', {
  key: varchar('setting_key', { length: 64 }).primaryKey(),
  value: json('value').notNull(),
});

/**
 * One row whose number moves on every successful write through the API. Each app process polls it and drops its
 * cached public reads when it moved, so a write in one process reaches the others within the poll interval.
 */
export const readGeneration = mysqlTable('read_generation', {
  id: int('id', { unsigned: true }).primaryKey(),
  generation: bigint('generation', { mode: 'number', unsigned: true }).notNull().default(0),
});
