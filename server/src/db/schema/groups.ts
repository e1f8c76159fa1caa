import { boolean, char, index, int, mysqlEnum, mysqlTable, text, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { GROUP_ROLES, MEMBERSHIP_STATUSES } from '../../../../shared/constants';
import { createdAt, id, ref, timestamp3 } from './columns';
import { users } from './users';

export const repairGroups = mysqlTable(
  'repair_groups',
  {
    id: id(),
    name: varchar('name', { length: 120 }).notNull(),
    slug: varchar('slug', { length: 80 }).notNull(),
    town: varchar('town', { length: 120 }).notNull(),
    description: text('description').notNull(),
    houseRules: text('house_rules'),
    timeZone: varchar('time_zone', { length: 64 }).notNull().default('Europe/London'),
    /** ISO 4217 code used to show part costs (formatted with Intl.NumberFormat). */
    currency: char('currency', { length: 3 }).notNull().default('GBP'),
    /** The language of the group's public pages and mails when nothing else decides (shared/i18n/languages.ts). */
    defaultLanguage: varchar('default_language', { length: 8 }).notNull().default('en'),
    /** ISO 3166-1 alpha-3 code of the group's country, for the Open Repair Data file; empty until an organiser sets it. */
    country: char('country', { length: 3 }),
    /** Whether the group's repair notes are searchable by the other groups of the network. */
    shareKnowledge: boolean('share_knowledge').notNull().default(false),
    /** Months after a session that visitors' names, addresses, phone numbers and photos are kept (then anonymised). */
    retentionMonths: int('retention_months').notNull().default(12),
    /** Where visitors write about their data; shown on the group's privacy page. */
    contactEmail: varchar('contact_email', { length: 254 }),
    /** When the retention job last ran for the group, and how many bookings it anonymised then. */
    retentionRanAt: timestamp3('retention_ran_at'),
    retentionAnonymised: int('retention_anonymised').notNull().default(0),
    /** Made by a network import for a group_identifier with no group yet: records only, until an admin hands it on. */
    historyOnly: boolean('history_only').notNull().default(false),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('repair_groups_slug_uq').on(t.slug)],
);

/** A person's role in one group; the same person may organise one group and fix at another. */
export const memberships = mysqlTable(
  'memberships',
  {
    id: id(),
    userId: ref('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    groupId: ref('group_id')
      .notNull()
      .references(() => repairGroups.id, { onDelete: 'cascade' }),
    role: mysqlEnum('role', GROUP_ROLES).notNull(),
    status: mysqlEnum('status', MEMBERSHIP_STATUSES).notNull().default('active'),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('memberships_uq').on(t.userId, t.groupId, t.role),
    index('memberships_group_idx').on(t.groupId, t.status),
  ],
);

export const venues = mysqlTable(
  'venues',
  {
    id: id(),
    groupId: ref('group_id')
      .notNull()
      .references(() => repairGroups.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 160 }).notNull(),
    address: varchar('address', { length: 255 }).notNull(),
    town: varchar('town', { length: 120 }).notNull(),
    accessNotes: text('access_notes').notNull(),
    createdAt: createdAt(),
  },
  (t) => [index('venues_group_idx').on(t.groupId)],
);

/** An organiser's invitation to join a group in a role; the link in the mail carries the token, only its hash is kept. */
export const invites = mysqlTable(
  'invites',
  {
    id: id(),
    groupId: ref('group_id')
      .notNull()
      .references(() => repairGroups.id, { onDelete: 'cascade' }),
    email: varchar('email', { length: 254 }).notNull(),
    role: mysqlEnum('role', GROUP_ROLES).notNull(),
    tokenHash: varchar('token_hash', { length: 64 }).notNull(),
    expiresAt: timestamp3('expires_at').notNull(),
    acceptedAt: timestamp3('accepted_at'),
    invitedBy: ref('invited_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('invites_token_uq').on(t.tokenHash), index('invites_group_idx').on(t.groupId)],
);
