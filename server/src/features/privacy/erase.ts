import { randomBytes } from 'node:crypto';
import type { AppContext } from '../../context';
import type { Tx } from '../../db/client';
import { withDeadlockRetry } from '../../db/retry';
import { sha256 } from '../../auth/tokens';
import { hasGroupRole } from '../../auth/guards';
import { checkManageToken } from '../../core/links';
import { notFound } from '../../http/errors';
import type { SessionUser } from '../../../../shared/schemas/auth';
import { ERASED_NAME, retentionCutoff, scrubPersonalData } from '../../../../shared/privacy/scrub';
import {
  bookingByReference,
  bookingsPastRetention,
  claimGroup,
  dropMailTo,
  eraseWaitlistEntry,
  groupOfEvent,
  groupsDueForRetention,
  itemsOfBooking,
  lockBookingRow,
  markBookingErased,
  recordRetentionRun,
  scrubItems,
  waitlistOfVisitor,
  waitlistPastRetention,
  type BookingRow,
} from './queries/erase';

/**
 * The booking behind a manage link, or, without a token, one of a group the signed-in organiser runs. Anything
 * else is "not found", so references leak nothing.
 */
export async function bookingForPersonalData(
  ctx: AppContext,
  reference: string,
  token: string | undefined,
  user: SessionUser | undefined,
): Promise<BookingRow> {
  const b = await bookingByReference(ctx.database.db, reference);
  if (!b) throw notFound('That booking');
  if (token) {
    await checkManageToken(ctx, b, token);
    return b;
  }
  const groupId = await groupOfEvent(ctx.database.db, b.eventId);
  if (groupId !== undefined && hasGroupRole(user, groupId, ['organiser'])) return b;
  throw notFound('That booking');
}

/**
 * Erases what a booking holds about its visitor, in the caller's transaction: name, e-mail, phone and the
 * consent name; photos; names, addresses and numbers in the fault and the notes about the items; their
 * waiting-list entries; and the mail to their address about this booking, queued or sent (with `before`, the
 * retention job's cutoff: every mail to the address older than that). The repair record (kind, brand, model,
 * outcome, weight) stays, so the statistics do not change. Answers the photos' storage keys, to delete after commit.
 */
export async function eraseBookingInTx(tx: Tx, b: BookingRow, before?: Date): Promise<string[]> {
  const names = [b.visitorName, b.consentName ?? ''].filter((n) => n && n !== ERASED_NAME);
  const f = (s: string) => scrubPersonalData(s, names);
  const items = await itemsOfBooking(tx, b.id);
  const keys = await scrubItems(
    tx,
    items.map((i) => i.id),
    f,
  );
  for (const w of await waitlistOfVisitor(tx, b)) await eraseWaitlistEntry(tx, w, ERASED_NAME, f);
  if (b.visitorEmail) await dropMailTo(tx, b.visitorEmail, before ? { before } : { reference: b.reference });
  // The manage link stops working: its token no longer matches.
  await markBookingErased(tx, b.id, ERASED_NAME, sha256(randomBytes(32).toString('hex')));
  return keys;
}

async function deleteBlobs(ctx: AppContext, keys: string[]) {
  for (const k of keys)
    await ctx.storage.delete(k).catch((err: Error) => ctx.log(`could not delete photo ${k}: ${err.message}`));
}

export async function eraseBooking(ctx: AppContext, bookingId: number) {
  const keys = await withDeadlockRetry(() =>
    ctx.database.db.transaction(async (tx) => {
      const b = await lockBookingRow(tx, bookingId);
      if (!b) throw notFound('That booking');
      return eraseBookingInTx(tx, b);
    }),
  );
  await deleteBlobs(ctx, keys);
}

/**
 * The daily retention job: for each group not run in the last day, bookings of sessions that ended more than the
 * group's months ago are anonymised, and so are the waiting-list entries of those sessions. Each group is taken
 * with SKIP LOCKED, so two processes never run it for the same group at once. Answers how many bookings it erased.
 */
export async function runRetention(ctx: AppContext, now = new Date()): Promise<number> {
  let total = 0;
  for (const g of await groupsDueForRetention(ctx.database.db, now)) {
    const cutoff = retentionCutoff(now, g.months);
    const keys: string[] = [];
    const n = await ctx.database.db.transaction(async (tx) => {
      const claimed = await claimGroup(tx, g.id);
      if (!claimed || (claimed.ranAt && claimed.ranAt.getTime() > now.getTime() - 24 * 3600_000)) return 0;
      const due = await bookingsPastRetention(tx, g.id, cutoff);
      for (const { booking } of due) keys.push(...(await eraseBookingInTx(tx, booking, cutoff)));
      for (const { entry } of await waitlistPastRetention(tx, g.id, cutoff)) {
        await eraseWaitlistEntry(tx, entry, ERASED_NAME, (s) => scrubPersonalData(s, [entry.visitorName]));
        await dropMailTo(tx, entry.visitorEmail, { before: cutoff });
      }
      await recordRetentionRun(tx, g.id, now, due.length);
      return due.length;
    });
    await deleteBlobs(ctx, keys);
    total += n;
  }
  return total;
}
