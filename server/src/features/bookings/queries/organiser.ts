import { and, asc, eq, inArray } from 'drizzle-orm';
import type { DbOrTx } from '../../../db/client';
import { bookingItems, bookings, categories, itemPhotos, slots, waitlistEntries } from '../../../db/schema/index';

/** Every booking of an event with its items, their photo ids, and the waiting list still open. */
export async function eventBookingRows(db: DbOrTx, eventId: number) {
  const rows = await db
    .select({
      id: bookings.id,
      reference: bookings.reference,
      status: bookings.status,
      visitorName: bookings.visitorName,
      visitorEmail: bookings.visitorEmail,
      visitorPhone: bookings.visitorPhone,
      createdAt: bookings.createdAt,
      slotId: bookings.slotId,
      slotStartsAt: slots.startsAt,
    })
    .from(bookings)
    .innerJoin(slots, eq(slots.id, bookings.slotId))
    .where(eq(bookings.eventId, eventId))
    .orderBy(asc(slots.startsAt), asc(bookings.id));
  const ids = rows.map((r) => r.id);
  const items = ids.length
    ? await db
        .select({
          id: bookingItems.id,
          bookingId: bookingItems.bookingId,
          categoryId: bookingItems.categoryId,
          categoryName: categories.name,
          categorySlug: categories.slug,
          skill: categories.skill,
          brand: bookingItems.brand,
          model: bookingItems.model,
          ageYears: bookingItems.ageYears,
          fault: bookingItems.fault,
          mains: bookingItems.mains,
          battery: bookingItems.battery,
        })
        .from(bookingItems)
        .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
        .where(inArray(bookingItems.bookingId, ids))
        .orderBy(asc(bookingItems.position))
    : [];
  const photos = items.length
    ? await db
        .select({ id: itemPhotos.publicId, itemId: itemPhotos.itemId })
        .from(itemPhotos)
        .where(
          inArray(
            itemPhotos.itemId,
            items.map((i) => i.id),
          ),
        )
    : [];
  const waiting = await db
    .select({
      id: waitlistEntries.id,
      slotId: waitlistEntries.slotId,
      visitorName: waitlistEntries.visitorName,
      places: waitlistEntries.places,
      status: waitlistEntries.status,
      offerExpiresAt: waitlistEntries.offerExpiresAt,
      createdAt: waitlistEntries.createdAt,
    })
    .from(waitlistEntries)
    .where(and(eq(waitlistEntries.eventId, eventId), inArray(waitlistEntries.status, ['waiting', 'offered'])))
    .orderBy(asc(waitlistEntries.id));

  return { rows, items, photos, waiting };
}
