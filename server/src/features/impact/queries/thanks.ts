import { and, eq, gte, inArray, isNotNull, isNull, lte } from 'drizzle-orm';
import type { DbOrTx } from '../../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  events,
  itemOutcomes,
  repairGroups,
  shifts,
  users,
} from '../../../db/schema/index';
import { arrivedVisit } from './visits';

/**
 * Events that ended between a week and two hours before `now` and have had no thank-you yet, five at a time,
 * locked so two runs never mail the same event.
 */
export const eventsDueThanks = (tx: DbOrTx, now: number) =>
  tx
    .select({ event: events, group: repairGroups })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(
      and(
        inArray(events.status, ['published', 'closed']),
        isNull(events.thankYouSentAt),
        lte(events.endsAt, new Date(now - 2 * 3600_000)),
        gte(events.endsAt, new Date(now - 7 * 86400_000)),
      ),
    )
    .limit(5)
    .for('update', { skipLocked: true });

/** The items that came to the event from visitors who gave an e-mail address, with their outcome. */
export const visitorItems = (tx: DbOrTx, eventId: number) =>
  tx
    .select({
      itemId: bookingItems.id,
      bookingId: bookings.id,
      email: bookings.visitorEmail,
      name: bookings.visitorName,
      categoryId: bookingItems.categoryId,
      categoryName: categories.name,
      categorySlug: categories.slug,
      language: bookings.language,
      weighedKg: bookingItems.weighedKg,
      outcome: itemOutcomes.outcome,
      part: itemOutcomes.partDescription,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, bookingItems.id))
    .where(and(eq(bookings.eventId, eventId), ...arrivedVisit(), isNotNull(bookings.visitorEmail)));

/** The volunteers who said they were coming. */
export const volunteersWhoCame = (tx: DbOrTx, eventId: number) =>
  tx
    .select({ email: users.email, name: users.name, language: users.language })
    .from(shifts)
    .innerJoin(users, eq(users.id, shifts.userId))
    .where(and(eq(shifts.eventId, eventId), eq(shifts.coming, true)));

export async function markThanked(tx: DbOrTx, eventId: number) {
  await tx.update(events).set({ thankYouSentAt: new Date() }).where(eq(events.id, eventId));
}
