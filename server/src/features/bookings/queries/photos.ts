import { eq } from 'drizzle-orm';
import type { DbOrTx } from '../../../db/client';
import { bookingItems, bookings, events, itemPhotos, repairGroups } from '../../../db/schema/index';

/** A stored photo with what decides who may see it: its booking, its group and whether the group shares notes. */
export async function photoWithOwner(db: DbOrTx, publicId: string) {
  const [p] = await db
    .select({
      key: itemPhotos.storageKey,
      type: itemPhotos.contentType,
      kind: itemPhotos.kind,
      reference: bookings.reference,
      groupId: events.groupId,
      shares: repairGroups.shareKnowledge,
    })
    .from(itemPhotos)
    .innerJoin(bookingItems, eq(bookingItems.id, itemPhotos.itemId))
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(eq(itemPhotos.publicId, publicId));
  return p;
}
