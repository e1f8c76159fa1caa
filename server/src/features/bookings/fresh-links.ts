import type { AppContext } from '../../context';
import { withDeadlockRetry } from '../../db/retry';
import { sha256 } from '../../auth/tokens';
import { enqueueMail } from '../../mail/outbox';
import { mailAllowance } from '../../mail/allowance';
import { manageTokenFor } from '../../core/links';
import { earliestLiveSessionEnd } from '../../../../shared/booking/manage-link';
import { itemsOf, lockBooking } from './queries/bookings';
import { slotWithContextById } from './queries/context';
import { currentBookingsOf, setManageToken } from './queries/fresh-links';
import { freshLinkMail } from './mails';
import { facts, labelsOf } from './write';

/**
 * Mails a fresh manage link for each current booking of `email` (its session ended at most MANAGE_LINK_DAYS ago),
 * one mail per booking through the outbox. Each fresh link raises the booking's token version, so the links mailed
 * before stop working; a booking whose mail the address's hourly allowance would not let go keeps its old link.
 * The caller answers the same whatever this finds, so nobody learns which addresses have bookings.
 */
export async function mailFreshLinks(ctx: AppContext, email: string): Promise<number> {
  const { db } = ctx.database;
  const found = await currentBookingsOf(db, email, earliestLiveSessionEnd(new Date(), ctx.env.MANAGE_LINK_DAYS));
  const allowance = mailAllowance(ctx);
  let mailed = 0;
  for (const { id } of found) {
    if (!(await allowance.take(email))) {
      await allowance.giveBack(email);
      break;
    }
    await withDeadlockRetry(() =>
      db.transaction(async (tx) => {
        const b = await lockBooking(tx, id);
        const version = b.manageTokenVersion + 1;
        const token = manageTokenFor(ctx, b.reference, version);
        await setManageToken(tx, b.id, version, sha256(token));
        const row = await slotWithContextById(tx, b.slotId);
        const items = labelsOf(await itemsOf(tx, b.id), b.language);
        await enqueueMail(tx, freshLinkMail(facts(ctx, row, { ...b, visitorEmail: b.visitorEmail! }, items, token)));
      }),
    );
    mailed++;
  }
  if (mailed) ctx.outbox.kick();
  return mailed;
}
