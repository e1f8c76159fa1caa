import { bigint, boolean, char, index, mysqlEnum, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, id, ref, timestamp3 } from './columns';

export const users = mysqlTable(
  'users',
  {
    id: id(),
    email: varchar('email', { length: 254 }).notNull(),
    name: varchar('name', { length: 120 }).notNull(),
    passwordHash: varchar('password_hash', { length: 255 }),
    admin: boolean('admin').notNull().default(false),
    /** The language the person chose for the app; null until they choose (the browser's then decides). */
    language: varchar('language', { length: 8 }),
    emailVerifiedAt: timestamp3('email_verified_at'),
    /** SHA-256 of the secret in the person's shift-calendar feed URL; null when no feed link is live (revoked). */
    calendarFeedHash: char('calendar_feed_hash', { length: 64 }),
    /** Two-factor sign-in: the TOTP secret, AES-256-GCM with a key derived from SESSION_SECRET (auth/totp.ts). */
    totpSecret: varchar('totp_secret', { length: 255 }),
    /** A secret shown at set-up and not yet confirmed with a first code; encrypted the same way. */
    totpPending: varchar('totp_pending', { length: 255 }),
    /** The time step of the last code accepted, so a code works only once. */
    totpLastStep: bigint('totp_last_step', { mode: 'number' }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('users_email_uq').on(t.email), uniqueIndex('users_calendar_feed_uq').on(t.calendarFeedHash)],
);

/** Single-use links sent by e-mail; only the SHA-256 of the token is stored. */
export const authTokens = mysqlTable(
  'auth_tokens',
  {
    id: id(),
    userId: ref('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    purpose: mysqlEnum('purpose', ['verify-email', 'reset-password']).notNull(),
    tokenHash: char('token_hash', { length: 64 }).notNull(),
    expiresAt: timestamp3('expires_at').notNull(),
    usedAt: timestamp3('used_at'),
    /** A sign-up's own password and name: confirming that sign-up's link sets them, so a later sign-up cannot lose them. */
    passwordHash: varchar('password_hash', { length: 255 }),
    name: varchar('name', { length: 120 }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('auth_tokens_hash_uq').on(t.tokenHash), index('auth_tokens_user_idx').on(t.userId, t.purpose)],
);
