import { boolean, index, int, json, mysqlEnum, mysqlTable, text, varchar } from 'drizzle-orm/mysql-core';
import { BARRIERS, ITEM_STATUSES, OUTCOMES } from '../../../../shared/event-day/constants';
import type { SafetyCheckValues } from '../../../../shared/schemas/event-day';
import { createdAt, id, ref, timestamp3 } from './columns';
import { bookingItems } from './events';
import { users } from './users';

/** Every status change of an item, when and by whom (null: the visitor or the system). */
export const itemStatusChanges = mysqlTable(
  'item_status_changes',
  {
    id: id(),
    itemId: ref('item_id')
      .notNull()
      .references(() => bookingItems.id, { onDelete: 'cascade' }),
    fromStatus: mysqlEnum('from_status', ITEM_STATUSES),
    toStatus: mysqlEnum('to_status', ITEM_STATUSES).notNull(),
    byUserId: ref('by_user_id').references(() => users.id, { onDelete: 'set null' }),
    note: varchar('note', { length: 200 }),
    createdAt: createdAt(),
  },
  (t) => [index('item_status_changes_item_idx').on(t.itemId, t.id)],
);

/** An electrical safety check with its readings and the verdict computed from shared/safety/limits. */
export const safetyChecks = mysqlTable(
  'safety_checks',
  {
    id: id(),
    itemId: ref('item_id')
      .notNull()
      .references(() => bookingItems.id, { onDelete: 'cascade' }),
    applianceClass: mysqlEnum('appliance_class', ['I', 'II', 'III']).notNull(),
    readings: json('readings').$type<SafetyCheckValues>().notNull(),
    instrument: varchar('instrument', { length: 120 }),
    pass: boolean('pass').notNull(),
    failures: json('failures').$type<string[]>().notNull(),
    checkedBy: ref('checked_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index('safety_checks_item_idx').on(t.itemId, t.id)],
);

/** What happened to an item: one row per item, rewritten if the outcome is corrected. */
export const itemOutcomes = mysqlTable(
  'item_outcomes',
  {
    itemId: ref('item_id')
      .primaryKey()
      .references(() => bookingItems.id, { onDelete: 'cascade' }),
    outcome: mysqlEnum('outcome', OUTCOMES).notNull(),
    barrier: mysqlEnum('barrier', BARRIERS),
    partDescription: varchar('part_description', { length: 200 }),
    partLink: varchar('part_link', { length: 300 }),
    partCostCents: int('part_cost_cents'),
    minutes: int('minutes'),
    notes: text('notes'),
    safetyCheckId: ref('safety_check_id').references(() => safetyChecks.id, { onDelete: 'set null' }),
    recordedBy: ref('recorded_by').references(() => users.id, { onDelete: 'set null' }),
    recordedAt: timestamp3('recorded_at').notNull(),
  },
  (t) => [index('item_outcomes_outcome_idx').on(t.outcome)],
);
