import { index, int, json, longtext, mysqlEnum, mysqlTable, text, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import type { ImportJobView } from '../../../../shared/api/imports';
import { createdAt, id, ref, timestamp3 } from './columns';
import { bookingItems } from './events';
import { repairGroups } from './groups';
import { users } from './users';

export const IMPORT_STATUSES = ['queued', 'running', 'done', 'failed'] as const;

/**
 * A file of earlier repair records being brought in. The job survives a restart: the file's text is kept here, and
 * `position` (the next record to write) moves in the same transaction as each batch of records.
 */
export const importJobs = mysqlTable(
  'import_jobs',
  {
    id: id(),
    /** The group brought into; null for a whole network's file (one group per group_identifier). */
    groupId: ref('group_id').references(() => repairGroups.id, { onDelete: 'cascade' }),
    scope: mysqlEnum('scope', ['group', 'network']).notNull(),
    createdBy: ref('created_by').references(() => users.id, { onDelete: 'set null' }),
    fileName: varchar('file_name', { length: 200 }).notNull(),
    content: longtext('content').notNull(),
    /** For a plain sheet: which of its columns holds each of our fields. */
    mapping: json('mapping').$type<Record<string, string>>().notNull(),
    kind: varchar('kind', { length: 16 }).notNull(),
    status: mysqlEnum('status', IMPORT_STATUSES).notNull().default('queued'),
    total: int('total').notNull().default(0),
    imported: int('imported').notNull().default(0),
    skipped: int('skipped').notNull().default(0),
    position: int('position').notNull().default(0),
    refusedCount: int('refused_count').notNull().default(0),
    refusals: json('refusals').$type<ImportJobView['errors']>().notNull(),
    message: text('message'),
    /** The process working on it holds it until then, and renews it after each batch. */
    leaseUntil: timestamp3('lease_until'),
    createdAt: createdAt(),
    finishedAt: timestamp3('finished_at'),
  },
  (t) => [index('import_jobs_status_idx').on(t.status, t.leaseUntil), index('import_jobs_group_idx').on(t.groupId)],
);

/** Each record brought in, keyed on its data provider and id, so bringing in the same file again adds nothing. */
export const importedRecords = mysqlTable(
  'imported_records',
  {
    id: id(),
    provider: varchar('provider', { length: 80 }).notNull(),
    recordId: varchar('record_id', { length: 80 }).notNull(),
    itemId: ref('item_id')
      .notNull()
      .references(() => bookingItems.id, { onDelete: 'cascade' }),
    jobId: ref('job_id').references(() => importJobs.id, { onDelete: 'set null' }),
    /** The standard's category as the file wrote it, given back by the export. */
    ordsCategory: varchar('ords_category', { length: 80 }),
  },
  (t) => [
    uniqueIndex('imported_records_key_uq').on(t.provider, t.recordId),
    index('imported_records_item_idx').on(t.itemId),
  ],
);
