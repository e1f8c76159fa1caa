import { and, asc, eq, inArray } from 'drizzle-orm';
import type { AppContext } from '../../context';
import { bookingItems, bookings, categories, itemPhotos, slots, waitlistEntries } from '../../db/schema/index';

/** What is coming to an event: every booking with its items, and counts by category and skill. */
export async function eventBookings(ctx: AppContext, eventId: number) {
  const { db } = ctx.database;
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
        .select({ id: itemPhotos.id, itemId: itemPhotos.itemId })
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

  const confirmedIds = new Set(rows.filter((r) => r.status === 'confirmed').map((r) => r.id));
  const counted = items.filter((i) => confirmedIds.has(i.bookingId));
  const tally = (key: (i: (typeof counted)[number]) => string) => {
    const m = new Map<string, number>();
    for (const i of counted) m.set(key(i), (m.get(key(i)) ?? 0) + 1);
    return [...m]
      .map(([name, count]) => ({ name, count }))
      .sort((a, b) => b.count - a.count || a.name.localeCompare(b.name));
  };
  return {
    bookings: rows.map((r) => ({
      ...r,
      items: items
        .filter((i) => i.bookingId === r.id)
        .map((i) => ({
          ...i,
          mains: Boolean(i.mains),
          battery: Boolean(i.battery),
          photoIds: photos.filter((p) => p.itemId === i.id).map((p) => p.id),
        })),
    })),
    waiting,
    summary: {
      items: counted.length,
      bookings: confirmedIds.size,
      byCategory: tally((i) => i.categoryName),
      bySkill: tally((i) => i.skill),
      mains: counted.filter((i) => i.mains).length,
    },
  };
}
