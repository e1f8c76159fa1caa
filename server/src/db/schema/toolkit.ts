import { boolean, index, int, json, mysqlEnum, mysqlTable, text, varchar } from 'drizzle-orm/mysql-core';
import { OUTCOMES } from '../../../../shared/event-day/constants';
import { PART_TYPES, type PartRatings } from '../../../../shared/salvage/constants';
import { createdAt, id, ref, timestamp3 } from './columns';
import { categories } from './categories';
import { bookingItems } from './events';
import { repairGroups } from './groups';
import { users } from './users';

/**
 * The knowledge base: one entry per item whose outcome has notes, kept in step with the outcome, with an optional
 * write-up by a fixer. A FULLTEXT index over brand, model and the texts (migration 0009, hand-written: drizzle-kit
 * does not declare FULLTEXT) serves the search.
 */
export const knowledgeEntries = mysqlTable(
  'knowledge_entries',
  {
    itemId: ref('item_id')
      .primaryKey()
      .references(() => bookingItems.id, { onDelete: 'cascade' }),
    groupId: ref('group_id')
      .notNull()
      .references(() => repairGroups.id, { onDelete: 'cascade' }),
    categoryId: ref('category_id')
      .notNull()
      .references(() => categories.id),
    brand: varchar('brand', { length: 80 }).notNull().default(''),
    model: varchar('model', { length: 80 }).notNull().default(''),
    outcome: mysqlEnum('outcome', OUTCOMES).notNull(),
    symptom: text('symptom').notNull(),
    notes: text('notes').notNull(),
    measured: text('measured').notNull(),
    faultyPart: varchar('faulty_part', { length: 200 }).notNull().default(''),
    fix: text('fix').notNull(),
    writtenUp: boolean('written_up').notNull().default(false),
    authorId: ref('author_id').references(() => users.id, { onDelete: 'set null' }),
    eventDate: timestamp3('event_date').notNull(),
    updatedAt: createdAt(),
  },
  (t) => [index('knowledge_group_cat_idx').on(t.groupId, t.categoryId), index('knowledge_cat_idx').on(t.categoryId)],
);

/** Parts saved from end-of-life items or donated, by the box they are in. */
export const salvageParts = mysqlTable(
  'salvage_parts',
  {
    id: id(),
    groupId: ref('group_id')
      .notNull()
      .references(() => repairGroups.id, { onDelete: 'cascade' }),
    type: mysqlEnum('type', PART_TYPES).notNull(),
    value: varchar('value', { length: 120 }).notNull(),
    ratings: json('ratings').$type<PartRatings>().notNull(),
    package: varchar('package', { length: 40 }).notNull().default(''),
    pinout: varchar('pinout', { length: 20 }).notNull().default(''),
    quantity: int('quantity').notNull(),
    box: varchar('box', { length: 60 }).notNull(),
    sourceItemId: ref('source_item_id').references(() => bookingItems.id, { onDelete: 'set null' }),
    notes: varchar('notes', { length: 300 }).notNull().default(''),
    addedBy: ref('added_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index('salvage_group_type_idx').on(t.groupId, t.type)],
);

/** A part taken from the stock for an item's repair. */
export const salvageTakes = mysqlTable(
  'salvage_takes',
  {
    id: id(),
    partId: ref('part_id')
      .notNull()
      .references(() => salvageParts.id, { onDelete: 'cascade' }),
    itemId: ref('item_id').references(() => bookingItems.id, { onDelete: 'set null' }),
    quantity: int('quantity').notNull(),
    takenBy: ref('taken_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index('salvage_takes_item_idx').on(t.itemId)],
);
