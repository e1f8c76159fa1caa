import { randomBytes } from 'node:crypto';
import {
  boolean,
  char,
  decimal,
  index,
  int,
  json,
  mysqlEnum,
  mysqlTable,
  primaryKey,
  text,
  uniqueIndex,
  varchar,
} from 'drizzle-orm/mysql-core';
import {
  BOOKING_STATUSES,
  EVENT_STATUSES,
  WAITLIST_STATUSES,
  type Hazard,
  type Skill,
} from '../../../../shared/constants';
import { ITEM_STATUSES } from '../../../../shared/event-day/constants';
import { createdAt, id, ref, timestamp3 } from './columns';
import { categories } from './categories';
import { repairGroups, venues } from './groups';

export const events = mysqlTable(
  'events',
  {
    id: id(),
    groupId: ref('group_id')
      .notNull()
      .references(() => repairGroups.id, { onDelete: 'cascade' }),
    venueId: ref('venue_id')
      .notNull()
      .references(() => venues.id),
    title: varchar('title', { length: 160 }).notNull(),
    description: text('description').notNull(),
    startsAt: timestamp3('starts_at').notNull(),
    endsAt: timestamp3('ends_at').notNull(),
    slotMinutes: int('slot_minutes').notNull(),
    slotCapacity: int('slot_capacity').notNull(),
    skillLimits: json('skill_limits').$type<Partial<Record<Skill, number>>>().notNull(),
    status: mysqlEnum('status', EVENT_STATUSES).notNull().default('draft'),
    publishedAt: timestamp3('published_at'),
    cancelledAt: timestamp3('cancelled_at'),
    /** When the thank-you mails went out after the event. */
    thankYouSentAt: timestamp3('thank_you_sent_at'),
    /** The last queue number handed out at the desk; taken under the event row's lock. */
    queueCounter: int('queue_counter').notNull().default(0),
    /** A past session made to hold records brought in from a file (one per group and date). */
    imported: boolean('imported').notNull().default(false),
    createdAt: createdAt(),
  },
  (t) => [
    index('events_status_starts_idx').on(t.status, t.startsAt),
    index('events_group_idx').on(t.groupId, t.startsAt),
  ],
);

/** booked + held never exceeds capacity: places are taken with a conditional UPDATE. */
export const slots = mysqlTable(
  'slots',
  {
    id: id(),
    eventId: ref('event_id')
      .notNull()
      .references(() => events.id, { onDelete: 'cascade' }),
    startsAt: timestamp3('starts_at').notNull(),
    endsAt: timestamp3('ends_at').notNull(),
    capacity: int('capacity').notNull(),
    booked: int('booked').notNull().default(0),
    /** Places kept for someone on the waiting list who has been offered them. */
    held: int('held').notNull().default(0),
  },
  (t) => [index('slots_event_idx').on(t.eventId, t.startsAt)],
);

/** Items per skill in a slot, for events with per-skill limits. */
export const slotSkillCounts = mysqlTable(
  'slot_skill_counts',
  {
    slotId: ref('slot_id')
      .notNull()
      .references(() => slots.id, { onDelete: 'cascade' }),
    skill: varchar('skill', { length: 32 }).notNull(),
    booked: int('booked').notNull().default(0),
  },
  (t) => [primaryKey({ columns: [t.slotId, t.skill] })],
);

export const bookings = mysqlTable(
  'bookings',
  {
    id: id(),
    reference: char('reference', { length: 7 }).notNull(),
    eventId: ref('event_id')
      .notNull()
      .references(() => events.id, { onDelete: 'cascade' }),
    slotId: ref('slot_id')
      .notNull()
      .references(() => slots.id),
    visitorName: varchar('visitor_name', { length: 120 }).notNull(),
    /** Walk-ins may leave no address. */
    visitorEmail: varchar('visitor_email', { length: 254 }),
    visitorPhone: varchar('visitor_phone', { length: 40 }),
    /** Came to the desk without booking; queued after the booked items of their slot. */
    walkIn: boolean('walk_in').notNull().default(false),
    /** For walk-ins: the name typed at the desk by the person accepting the house rules. */
    consentName: varchar('consent_name', { length: 120 }),
    /** The visitor's language when booking: every mail about the booking goes out in it, whoever sends it. */
    language: varchar('language', { length: 8 }).notNull().default('en'),
    manageTokenHash: char('manage_token_hash', { length: 64 }).notNull(),
    /** Goes up by one with each fresh manage link mailed; the token is an HMAC of the reference and this. */
    manageTokenVersion: int('manage_token_version').notNull().default(1),
    status: mysqlEnum('status', BOOKING_STATUSES).notNull().default('confirmed'),
    consentAt: timestamp3('consent_at').notNull(),
    reminderSentAt: timestamp3('reminder_sent_at'),
    cancelledAt: timestamp3('cancelled_at'),
    /** When the visitor's personal data was erased (on request or after the group's retention period). */
    anonymisedAt: timestamp3('anonymised_at'),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('bookings_reference_uq').on(t.reference),
    index('bookings_event_idx').on(t.eventId, t.status),
    index('bookings_slot_idx').on(t.slotId),
    index('bookings_email_idx').on(t.visitorEmail),
  ],
);

export const bookingItems = mysqlTable(
  'booking_items',
  {
    id: id(),
    bookingId: ref('booking_id')
      .notNull()
      .references(() => bookings.id, { onDelete: 'cascade' }),
    categoryId: ref('category_id')
      .notNull()
      .references(() => categories.id),
    brand: varchar('brand', { length: 80 }),
    model: varchar('model', { length: 80 }),
    ageYears: int('age_years'),
    fault: text('fault').notNull(),
    mains: boolean('mains').notNull(),
    battery: boolean('battery').notNull().default(false),
    position: int('position').notNull(),
    status: mysqlEnum('status', ITEM_STATUSES).notNull().default('booked'),
    /** A return visit (the part bought): the earlier visit it continues; the statistics count the item once. */
    returnOfItemId: ref('return_of_item_id'),
    tagCode: char('tag_code', { length: 5 }),
    queueNumber: int('queue_number'),
    /** Weighed at the desk; overrides the category's average weight in the statistics. */
    weighedKg: decimal('weighed_kg', { precision: 8, scale: 3, mode: 'number' }),
    checkedInAt: timestamp3('checked_in_at'),
    startedAt: timestamp3('started_at'),
    doneAt: timestamp3('done_at'),
    createdAt: createdAt(),
  },
  (t) => [
    index('booking_items_booking_idx').on(t.bookingId),
    uniqueIndex('booking_items_tag_uq').on(t.tagCode),
    index('booking_items_status_idx').on(t.status),
    index('booking_items_return_idx').on(t.returnOfItemId),
  ],
);

export const itemPhotos = mysqlTable(
  'item_photos',
  {
    id: id(),
    /** The photo's name in every URL: 128 random bits, so nobody can walk from one photo to the next. */
    publicId: varchar('public_id', { length: 32 })
      .notNull()
      .$defaultFn(() => randomBytes(16).toString('base64url')),
    itemId: ref('item_id')
      .notNull()
      .references(() => bookingItems.id, { onDelete: 'cascade' }),
    storageKey: varchar('storage_key', { length: 200 }).notNull(),
    /** The visitor's photos from booking, or the fixer's from the bench (before, during, after). */
    kind: mysqlEnum('kind', ['intake', 'repair']).notNull().default('intake'),
    contentType: varchar('content_type', { length: 40 }).notNull(),
    width: int('width').notNull(),
    height: int('height').notNull(),
    bytes: int('bytes').notNull(),
    createdAt: createdAt(),
  },
  (t) => [index('item_photos_item_idx').on(t.itemId), uniqueIndex('item_photos_public_uq').on(t.publicId)],
);

/** A submitted form's key and its first answer: the same key replays the answer instead of booking again. */
export const idempotencyKeys = mysqlTable('idempotency_keys', {
  key: varchar('idem_key', { length: 100 }).primaryKey(),
  scope: varchar('scope', { length: 40 }).notNull(),
  statusCode: int('status_code'),
  response: json('response'),
  /** SHA-256 of the request body: the key replays only for the same form. */
  bodyHash: char('body_hash', { length: 64 }),
  createdAt: createdAt(),
});

export const waitlistEntries = mysqlTable(
  'waitlist_entries',
  {
    id: id(),
    eventId: ref('event_id')
      .notNull()
      .references(() => events.id, { onDelete: 'cascade' }),
    slotId: ref('slot_id')
      .notNull()
      .references(() => slots.id, { onDelete: 'cascade' }),
    visitorName: varchar('visitor_name', { length: 120 }).notNull(),
    visitorEmail: varchar('visitor_email', { length: 254 }).notNull(),
    /** The booking form as submitted, so a claim books it in one step. */
    request: json('request')
      .$type<{
        visitor: { name: string; email: string; phone?: string };
        items: {
          categoryId: number;
          brand?: string;
          model?: string;
          ageYears?: number;
          fault: string;
          mains?: boolean;
          battery?: boolean;
          hazards: Hazard[];
        }[];
        /** The visitor's language when joining (older entries have none: the group's default then). */
        language?: string;
      }>()
      .notNull(),
    places: int('places').notNull(),
    status: mysqlEnum('status', WAITLIST_STATUSES).notNull().default('waiting'),
    claimTokenHash: char('claim_token_hash', { length: 64 }),
    offeredAt: timestamp3('offered_at'),
    offerExpiresAt: timestamp3('offer_expires_at'),
    bookingId: ref('booking_id'),
    createdAt: createdAt(),
  },
  (t) => [
    index('waitlist_slot_idx').on(t.slotId, t.status, t.id),
    uniqueIndex('waitlist_claim_uq').on(t.claimTokenHash),
    index('waitlist_offer_idx').on(t.status, t.offerExpiresAt),
  ],
);
