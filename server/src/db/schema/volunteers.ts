import {
  boolean,
  index,
  json,
  mysqlEnum,
  mysqlTable,
  primaryKey,
  text,
  tinyint,
  uniqueIndex,
  varchar,
  int,
} from 'drizzle-orm/mysql-core';
import type { Equipment } from '../../../../shared/constants';
import { createdAt, id, ref, timestamp3 } from './columns';
import { events, bookingItems } from './events';
import { venues } from './groups';
import { users } from './users';

/** A fixer's skills, each at 1 learning, 2 capable or 3 expert; they go with the person to every group. */
export const volunteerSkills = mysqlTable(
  'volunteer_skills',
  {
    userId: ref('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    skill: varchar('skill', { length: 32 }).notNull(),
    level: tinyint('level').notNull(),
  },
  (t) => [primaryKey({ columns: [t.userId, t.skill] })],
);

export const volunteerProfiles = mysqlTable('volunteer_profiles', {
  userId: ref('user_id')
    .primaryKey()
    .references(() => users.id, { onDelete: 'cascade' }),
  kit: json('kit').$type<Equipment[]>().notNull(),
  notes: text('notes').notNull(),
});

/** A venue's usual layout of benches; each event copies it and may change its copy. */
export const venueBenches = mysqlTable(
  'venue_benches',
  {
    id: id(),
    venueId: ref('venue_id')
      .notNull()
      .references(() => venues.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 80 }).notNull(),
    seats: int('seats').notNull(),
    equipment: json('equipment').$type<Equipment[]>().notNull(),
    position: int('position').notNull().default(0),
  },
  (t) => [index('venue_benches_venue_idx').on(t.venueId)],
);

export const eventBenches = mysqlTable(
  'event_benches',
  {
    id: id(),
    eventId: ref('event_id')
      .notNull()
      .references(() => events.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 80 }).notNull(),
    seats: int('seats').notNull(),
    equipment: json('equipment').$type<Equipment[]>().notNull(),
    position: int('position').notNull().default(0),
  },
  (t) => [index('event_benches_event_idx').on(t.eventId)],
);

/** A volunteer's answer for one event: coming or not, for which hours, and optionally seated at a bench. */
export const shifts = mysqlTable(
  'shifts',
  {
    id: id(),
    eventId: ref('event_id')
      .notNull()
      .references(() => events.id, { onDelete: 'cascade' }),
    userId: ref('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    coming: boolean('coming').notNull(),
    startsAt: timestamp3('starts_at').notNull(),
    endsAt: timestamp3('ends_at').notNull(),
    benchId: ref('bench_id').references(() => eventBenches.id, { onDelete: 'set null' }),
    updatedAt: createdAt(),
  },
  (t) => [uniqueIndex('shifts_event_user_uq').on(t.eventId, t.userId)],
);

/** Where an item goes: the latest engine run or an organiser's hand; a locked one survives re-runs. */
export const itemAssignments = mysqlTable(
  'item_assignments',
  {
    itemId: ref('item_id')
      .primaryKey()
      .references(() => bookingItems.id, { onDelete: 'cascade' }),
    eventId: ref('event_id')
      .notNull()
      .references(() => events.id, { onDelete: 'cascade' }),
    userId: ref('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    benchId: ref('bench_id')
      .notNull()
      .references(() => eventBenches.id, { onDelete: 'cascade' }),
    locked: boolean('locked').notNull().default(false),
    source: mysqlEnum('source', ['engine', 'hand']).notNull(),
    /** When the repair is planned to start; with the category's minutes it says when fixer and bench are busy. */
    startsAt: timestamp3('starts_at'),
    runId: ref('run_id'),
    updatedAt: createdAt(),
  },
  (t) => [index('item_assignments_event_idx').on(t.eventId), index('item_assignments_user_idx').on(t.userId)],
);

/** Every engine run with the exact input it saw and what it answered, so a decision can be explained later. */
export const triageRuns = mysqlTable(
  'triage_runs',
  {
    id: id(),
    eventId: ref('event_id')
      .notNull()
      .references(() => events.id, { onDelete: 'cascade' }),
    slotId: ref('slot_id'),
    input: json('input').notNull(),
    result: json('result').notNull(),
    lockedKept: int('locked_kept').notNull(),
    createdBy: ref('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index('triage_runs_event_idx').on(t.eventId, t.id)],
);
