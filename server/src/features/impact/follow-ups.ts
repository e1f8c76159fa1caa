import { and, asc, eq, inArray, isNotNull, isNull, lte } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import type { Outcome } from '../../../../shared/event-day/constants';
import {
  FOLLOW_UP_LABELS,
  FOLLOW_UP_REMINDER_DAYS,
  reminderDue,
  type FollowUpStatus,
} from '../../../../shared/impact/follow-ups';
import type { AppContext } from '../../context';
import type { DbOrTx, Tx } from '../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  events,
  followUps,
  itemOutcomes,
  repairGroups,
} from '../../db/schema/index';
import { HttpError, notFound } from '../../http/errors';
import { enqueueMail } from '../../mail/outbox';
import { composeMail } from '../../mail/templates';
import type { ItemRow } from '../../core/items';
import { rebookUrl } from '../../core/links';
import { itemLabel } from '../../../../shared/item-label';

function partMail(
  ctx: AppContext,
  to: string,
  f: {
    visitorName: string;
    groupName: string;
    itemLabel: string;
    part: string;
    link: string | null;
    cost: number | null;
    itemId: number;
  },
  reminder: boolean,
) {
  return composeMail(
    to,
    reminder ? `Still waiting for the part? ${f.itemLabel}` : `The part your ${f.itemLabel.toLowerCase()} needs`,
    {
      paragraphs: [
        `Hello ${f.visitorName.split(' ')[0]},`,
        reminder
          ? `six weeks ago a fixer at ${f.groupName} found that your ${f.itemLabel.toLowerCase()} needs a part. If you have it now, bring it to a session: the link below books you a place ahead of the queue.`
          : `thank you for coming to ${f.groupName}. Your ${f.itemLabel.toLowerCase()} can be repaired once it has a new part.`,
        `The part: ${f.part}.${f.link ? ` Where to find it: ${f.link}.` : ''}${f.cost !== null ? ` Expect to pay about ${f.cost.toFixed(2)}.` : ''}`,
        'When you have it, book a return visit with this link: it keeps a place for you even when a session is full, and the fixers will know what to expect.',
      ],
      action: { label: 'Book a return visit', url: rebookUrl(ctx, f.itemId) },
      footnote:
        'Check the part’s numbers against the old one before buying. If you decide not to go ahead, let the group know by replying.',
    },
  );
}

/**
 * After an outcome: a part needed opens (or keeps) the follow-up and mails the visitor; a return visit moves the
 * earlier item's follow-up on; a corrected outcome that needs no part closes its follow-up.
 */
export async function afterOutcome(ctx: AppContext, tx: Tx, row: ItemRow, outcome: Outcome) {
  const itemId = row.item.id;
  if (outcome === 'parts-needed') {
    const [existing] = await tx.select().from(followUps).where(eq(followUps.itemId, itemId));
    if (!existing) {
      await tx.insert(followUps).values({ itemId, groupId: row.group.id, status: 'open' });
      const [o] = await tx.select().from(itemOutcomes).where(eq(itemOutcomes.itemId, itemId));
      if (row.booking.visitorEmail && o?.partDescription) {
        await enqueueMail(
          tx,
          partMail(
            ctx,
            row.booking.visitorEmail,
            {
              visitorName: row.booking.visitorName,
              groupName: row.group.name,
              itemLabel: row.category.name,
              part: o.partDescription,
              link: o.partLink,
              cost: o.partCostCents === null ? null : o.partCostCents / 100,
              itemId,
            },
            false,
          ),
        );
        await tx.update(followUps).set({ mailedAt: new Date() }).where(eq(followUps.itemId, itemId));
      }
    }
  } else {
    await tx.delete(followUps).where(and(eq(followUps.itemId, itemId), eq(followUps.status, 'open')));
  }
  if (row.item.returnOfItemId) {
    await tx
      .update(followUps)
      .set({
        status: outcome === 'fixed' ? 'fixed-at-return' : 'came-back',
        returnItemId: itemId,
        updatedAt: new Date(),
      })
      .where(eq(followUps.itemId, row.item.returnOfItemId));
  }
}

/** A return visit checked in at the desk: its earlier item's follow-up says it came back. */
export async function markCameBack(tx: DbOrTx, itemIds: number[]) {
  if (!itemIds.length) return;
  const returns = await tx
    .select({ id: bookingItems.id, returnOf: bookingItems.returnOfItemId })
    .from(bookingItems)
    .where(and(inArray(bookingItems.id, itemIds), isNotNull(bookingItems.returnOfItemId)));
  for (const r of returns) {
    await tx
      .update(followUps)
      .set({ status: 'came-back', returnItemId: r.id, updatedAt: new Date() })
      .where(and(eq(followUps.itemId, r.returnOf!), inArray(followUps.status, ['open', 'part-ordered', 'rebooked'])));
  }
}

/** The organisers' list: every item of the group waiting for a part, oldest first, with what happened since. */
export async function listFollowUps(ctx: AppContext, groupId: number) {
  const ret = alias(bookingItems, 'return_item');
  const retBooking = alias(bookings, 'return_booking');
  const retEvent = alias(events, 'return_event');
  const rows = await ctx.database.db
    .select({
      f: followUps,
      categoryName: categories.name,
      brand: bookingItems.brand,
      model: bookingItems.model,
      visitorName: bookings.visitorName,
      visitorEmail: bookings.visitorEmail,
      visitorPhone: bookings.visitorPhone,
      reference: bookings.reference,
      eventTitle: events.title,
      eventStartsAt: events.startsAt,
      part: itemOutcomes.partDescription,
      partLink: itemOutcomes.partLink,
      partCostCents: itemOutcomes.partCostCents,
      returnReference: retBooking.reference,
      returnEventTitle: retEvent.title,
      returnStartsAt: retEvent.startsAt,
    })
    .from(followUps)
    .innerJoin(bookingItems, eq(bookingItems.id, followUps.itemId))
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, followUps.itemId))
    .leftJoin(ret, eq(ret.id, followUps.returnItemId))
    .leftJoin(retBooking, eq(retBooking.id, ret.bookingId))
    .leftJoin(retEvent, eq(retEvent.id, retBooking.eventId))
    .where(eq(followUps.groupId, groupId))
    .orderBy(asc(followUps.createdAt));
  const now = new Date();
  return rows.map((r) => ({
    itemId: r.f.itemId,
    status: r.f.status,
    statusLabel: FOLLOW_UP_LABELS[r.f.status],
    createdAt: r.f.createdAt,
    mailedAt: r.f.mailedAt,
    remindedAt: r.f.remindedAt,
    returnItemId: r.f.returnItemId,
    note: r.f.note,
    ageDays: Math.floor((now.getTime() - r.f.createdAt.getTime()) / 86400_000),
    reminderDue: reminderDue({ status: r.f.status, createdAt: r.f.createdAt, remindedAt: r.f.remindedAt }, now),
    item: itemLabel(r),
    part: r.part,
    partLink: r.partLink,
    partCost: r.partCostCents === null ? null : r.partCostCents / 100,
    visitor: { name: r.visitorName, email: r.visitorEmail, phone: r.visitorPhone, reference: r.reference },
    event: { title: r.eventTitle, startsAt: r.eventStartsAt },
    rebookUrl: ['open', 'part-ordered'].includes(r.f.status) ? rebookUrl(ctx, r.f.itemId) : null,
    returnVisit: r.returnReference
      ? { reference: r.returnReference, eventTitle: r.returnEventTitle, startsAt: r.returnStartsAt }
      : null,
  }));
}

export async function setFollowUpStatus(ctx: AppContext, itemId: number, status: FollowUpStatus, note?: string) {
  const res = await ctx.database.db
    .update(followUps)
    .set({ status, updatedAt: new Date(), ...(note !== undefined ? { note } : {}) })
    .where(eq(followUps.itemId, itemId));
  if ((res as unknown as [{ affectedRows: number }])[0].affectedRows === 0) throw notFound('That follow-up');
}

export async function followUpGroupId(db: DbOrTx, itemId: number) {
  if (!Number.isInteger(itemId) || itemId <= 0) return 0;
  const [f] = await db.select({ groupId: followUps.groupId }).from(followUps).where(eq(followUps.itemId, itemId));
  return f?.groupId ?? 0;
}

/**
 * A return visit was booked through the follow-up's link: the follow-up says so, once. A second return visit for
 * the same item is refused here, inside the booking's transaction, so it books nothing.
 */
export async function markRebooked(tx: Tx, e: { earlierItemId: number; returnItemId: number }) {
  const res = await tx
    .update(followUps)
    .set({ status: 'rebooked', returnItemId: e.returnItemId, updatedAt: new Date() })
    .where(and(eq(followUps.itemId, e.earlierItemId), isNull(followUps.returnItemId)));
  if ((res as unknown as [{ affectedRows: number }])[0].affectedRows !== 1)
    throw new HttpError(409, 'already-booked', 'A return visit is already booked for this item.');
}

/** Six weeks with no news: one reminder to the visitor, with the same link. */
export async function sendFollowUpReminders(ctx: AppContext): Promise<number> {
  const cutoff = new Date(Date.now() - FOLLOW_UP_REMINDER_DAYS * 86400_000);
  const sent = await ctx.database.db.transaction(async (tx) => {
    const due = await tx
      .select({
        f: followUps,
        booking: bookings,
        categoryName: categories.name,
        groupName: repairGroups.name,
        o: itemOutcomes,
      })
      .from(followUps)
      .innerJoin(bookingItems, eq(bookingItems.id, followUps.itemId))
      .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
      .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
      .innerJoin(repairGroups, eq(repairGroups.id, followUps.groupId))
      .innerJoin(itemOutcomes, eq(itemOutcomes.itemId, followUps.itemId))
      .where(
        and(
          inArray(followUps.status, ['open', 'part-ordered']),
          isNull(followUps.remindedAt),
          lte(followUps.createdAt, cutoff),
        ),
      )
      .limit(200)
      .for('update', { skipLocked: true });
    for (const d of due) {
      if (d.booking.visitorEmail && d.o.partDescription) {
        await enqueueMail(
          tx,
          partMail(
            ctx,
            d.booking.visitorEmail,
            {
              visitorName: d.booking.visitorName,
              groupName: d.groupName,
              itemLabel: d.categoryName,
              part: d.o.partDescription,
              link: d.o.partLink,
              cost: d.o.partCostCents === null ? null : d.o.partCostCents / 100,
              itemId: d.f.itemId,
            },
            true,
          ),
        );
      }
      await tx.update(followUps).set({ remindedAt: new Date() }).where(eq(followUps.itemId, d.f.itemId));
    }
    return due.length;
  });
  if (sent) ctx.outbox.kick();
  return sent;
}
