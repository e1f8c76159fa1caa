import { date, decimal, index, int, mysqlEnum, mysqlTable, primaryKey, varchar } from 'drizzle-orm/mysql-core';
import { FOLLOW_UP_STATUSES } from '../../../../shared/impact/follow-ups';
import { createdAt, ref, timestamp3 } from './columns';
import { categories } from './categories';
import { bookingItems, events } from './events';
import { repairGroups } from './groups';

/**
 * The statistics, rolled up per event and category (shared/impact ImpactCell). Rewritten for an event in the
 * same transaction as any check-in or outcome of that event, so a read never sees a half-changed picture.
 * Masses are kept as "weighed kg" plus "how many fixed were not weighed", so a changed category average applies
 * at once; emissions are computed at read time from the current factors.
 */
export const impactCells = mysqlTable(
  'impact_cells',
  {
    eventId: ref('event_id')
      .notNull()
      .references(() => events.id, { onDelete: 'cascade' }),
    categoryId: ref('category_id')
      .notNull()
      .references(() => categories.id),
    groupId: ref('group_id')
      .notNull()
      .references(() => repairGroups.id, { onDelete: 'cascade' }),
    eventDate: date('event_date', { mode: 'string' }).notNull(),
    items: int('items').notNull(),
    fixed: int('fixed').notNull(),
    partsNeeded: int('parts_needed').notNull(),
    advice: int('advice').notNull(),
    endOfLife: int('end_of_life').notNull(),
    fixedWeighedKg: decimal('fixed_weighed_kg', { precision: 12, scale: 3, mode: 'number' }).notNull(),
    fixedUnweighed: int('fixed_unweighed').notNull(),
    bSparePartsNotAvailable: int('b_spare_parts_not_available').notNull().default(0),
    bSparePartsTooExpensive: int('b_spare_parts_too_expensive').notNull().default(0),
    bNoWayToOpen: int('b_no_way_to_open').notNull().default(0),
    bRepairInformationNotAvailable: int('b_repair_information_not_available').notNull().default(0),
    bLackOfEquipment: int('b_lack_of_equipment').notNull().default(0),
    bTooWornOut: int('b_too_worn_out').notNull().default(0),
  },
  (t) => [
    primaryKey({ columns: [t.eventId, t.categoryId] }),
    index('impact_cells_date_group_idx').on(t.eventDate, t.groupId),
    index('impact_cells_group_date_idx').on(t.groupId, t.eventDate),
  ],
);

/**
 * The same counters for the whole network, per day and category: the sum of impact_cells by (event_date,
 * category_id), moved by the difference each time an event's cells are rewritten (same transaction), so a
 * network read sums a few rows a day instead of every event's cells. `node server/scripts/bootstrap.mjs
 * stats-rebuild` rebuilds both.
 */
export const impactDays = mysqlTable(
  'impact_days',
  {
    eventDate: date('event_date', { mode: 'string' }).notNull(),
    categoryId: ref('category_id')
      .notNull()
      .references(() => categories.id),
    items: int('items').notNull(),
    fixed: int('fixed').notNull(),
    partsNeeded: int('parts_needed').notNull(),
    advice: int('advice').notNull(),
    endOfLife: int('end_of_life').notNull(),
    fixedWeighedKg: decimal('fixed_weighed_kg', { precision: 14, scale: 3, mode: 'number' }).notNull(),
    fixedUnweighed: int('fixed_unweighed').notNull(),
    bSparePartsNotAvailable: int('b_spare_parts_not_available').notNull().default(0),
    bSparePartsTooExpensive: int('b_spare_parts_too_expensive').notNull().default(0),
    bNoWayToOpen: int('b_no_way_to_open').notNull().default(0),
    bRepairInformationNotAvailable: int('b_repair_information_not_available').notNull().default(0),
    bLackOfEquipment: int('b_lack_of_equipment').notNull().default(0),
    bTooWornOut: int('b_too_worn_out').notNull().default(0),
  },
  (t) => [primaryKey({ columns: [t.eventDate, t.categoryId] })],
);

/** An item waiting for a part: what the group did about it and what the visitor did. */
export const followUps = mysqlTable(
  'follow_ups',
  {
    itemId: ref('item_id')
      .primaryKey()
      .references(() => bookingItems.id, { onDelete: 'cascade' }),
    groupId: ref('group_id')
      .notNull()
      .references(() => repairGroups.id, { onDelete: 'cascade' }),
    status: mysqlEnum('status', FOLLOW_UP_STATUSES).notNull().default('open'),
    mailedAt: timestamp3('mailed_at'),
    remindedAt: timestamp3('reminded_at'),
    returnItemId: ref('return_item_id'),
    note: varchar('note', { length: 300 }),
    createdAt: createdAt(),
    updatedAt: timestamp3('updated_at'),
  },
  (t) => [index('follow_ups_group_idx').on(t.groupId, t.status), index('follow_ups_due_idx').on(t.status, t.createdAt)],
);
