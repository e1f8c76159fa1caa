import { eq } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { bookings, events, repairGroups, slots, venues } from '../../db/schema/index';

/** A slot with the event, group and venue it belongs to: what every booking mail and check needs. */
export const slotWithContext = (db: DbOrTx) =>
  db
    .select({ slot: slots, event: events, group: repairGroups, venue: venues })
    .from(slots)
    .innerJoin(events, eq(events.id, slots.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(venues, eq(venues.id, events.venueId));

/** A booking with its slot, event, group and venue. */
export const bookingWithContext = (db: DbOrTx) =>
  db
    .select({ booking: bookings, slot: slots, event: events, group: repairGroups, venue: venues })
    .from(bookings)
    .innerJoin(slots, eq(slots.id, bookings.slotId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(venues, eq(venues.id, events.venueId));
