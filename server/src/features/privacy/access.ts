import type { AppContext } from '../../context';
import { HttpError, notFound } from '../../http/errors';
import type { BookingRow } from './queries/erase';
import {
  accountRecords,
  adminCount,
  closeAccountRows,
  eventWithGroup,
  itemsWithDetail,
  mailAbout,
  photosOfItems,
  userById,
  waitlistOfBooking,
} from './queries/access';

/** Everything Mendery holds about one booking, for the visitor to download (a copy of their data). */
export async function bookingDataCopy(ctx: AppContext, b: BookingRow) {
  const { db } = ctx.database;
  const items = await itemsWithDetail(db, b.id);
  const photos = await photosOfItems(
    db,
    items.map((i) => i.id),
  );
  return {
    madeAt: new Date().toISOString(),
    about: 'Everything this booking holds about you at Mendery.',
    booking: {
      reference: b.reference,
      status: b.status,
      walkIn: b.walkIn,
      bookedAt: b.createdAt,
      houseRulesAcceptedAt: b.consentAt,
      cancelledAt: b.cancelledAt,
      erasedAt: b.anonymisedAt,
      reminderSentAt: b.reminderSentAt,
    },
    you: { name: b.visitorName, email: b.visitorEmail, phone: b.visitorPhone, nameGivenAtDesk: b.consentName },
    session: (await eventWithGroup(db, b.eventId)) ?? null,
    items: items.map((i) => ({ ...i, photos: photos.filter((p) => p.itemId === i.id) })),
    waitingList: await waitlistOfBooking(db, b.id),
    mails: b.visitorEmail ? await mailAbout(db, b.visitorEmail, b.reference) : [],
  };
}

/** Everything an account holds, for the volunteer to download. */
export async function accountDataCopy(ctx: AppContext, userId: number) {
  const { db } = ctx.database;
  const u = await userById(db, userId);
  if (!u) throw notFound('That account');
  return {
    madeAt: new Date().toISOString(),
    about: 'Everything your Mendery account holds about you.',
    account: {
      name: u.name,
      email: u.email,
      admin: u.admin,
      createdAt: u.createdAt,
      emailVerifiedAt: u.emailVerifiedAt,
      calendarFeed: u.calendarFeedHash ? 'on' : 'off',
    },
    ...(await accountRecords(db, userId)),
  };
}

export async function closeAccount(ctx: AppContext, userId: number) {
  await ctx.database.db.transaction(async (tx) => {
    const u = await userById(tx, userId);
    if (!u) throw notFound('That account');
    if (u.admin) {
      if ((await adminCount(tx)) <= 1)
        throw new HttpError(409, 'last-admin', 'You are the only administrator: make someone else one first.');
    }
    await closeAccountRows(tx, userId);
  });
}
