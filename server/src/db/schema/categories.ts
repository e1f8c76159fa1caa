import {
  boolean,
  decimal,
  int,
  json,
  mysqlTable,
  primaryKey,
  tinyint,
  uniqueIndex,
  varchar,
} from 'drizzle-orm/mysql-core';
import type { Equipment, Skill } from '../../../../shared/constants';
import { id, ref } from './columns';
import { repairGroups } from './groups';

/** The item taxonomy, seeded from shared/categories.ts and editable by admins. */
export const categories = mysqlTable(
  'categories',
  {
    id: id(),
    slug: varchar('slug', { length: 60 }).notNull(),
    name: varchar('name', { length: 120 }).notNull(),
    weeeCategory: tinyint('weee_category'),
    unuKey: varchar('unu_key', { length: 8 }),
    avgWeightKg: decimal('avg_weight_kg', { precision: 8, scale: 3, mode: 'number' }).notNull(),
    weightSource: varchar('weight_source', { length: 255 }).notNull(),
    skill: varchar('skill', { length: 32 }).$type<Skill>().notNull(),
    equipment: json('equipment').$type<Equipment[]>().notNull(),
    repairMinutes: int('repair_minutes').notNull(),
    mains: boolean('mains').notNull(),
    /** Production emission factor, kg CO2e per kg (shared/impact/factors.ts); null: no sourced factor. */
    co2ePerKg: decimal('co2e_per_kg', { precision: 10, scale: 5, mode: 'number' }),
    co2eSource: varchar('co2e_source', { length: 255 }),
    refusal: json('refusal').$type<{ reason: string; suggestion: string } | null>(),
    sort: int('sort').notNull().default(0),
  },
  (t) => [uniqueIndex('categories_slug_uq').on(t.slug)],
);

/** The categories a group does not take. */
export const groupExclusions = mysqlTable(
  'group_exclusions',
  {
    groupId: ref('group_id')
      .notNull()
      .references(() => repairGroups.id, { onDelete: 'cascade' }),
    categoryId: ref('category_id')
      .notNull()
      .references(() => categories.id, { onDelete: 'cascade' }),
  },
  (t) => [primaryKey({ columns: [t.groupId, t.categoryId] })],
);
