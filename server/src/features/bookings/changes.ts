import type { AppContext } from '../../context';
import type { Tx } from '../../db/client';
import { withDeadlockRetry } from '../../db/retry';
import { HttpError } from '../../http/errors';
import { enqueueMail } from '../../mail/outbox';
import { countSkills } from '../../../../shared/booking/bookability';
import type { Skill } from '../../../../shared/constants';
import { cancelBookingRow, itemsOf, itemStatuses, lockBooking, moveBookingRow } from './queries/bookings';
import { releaseSkillPlaces } from './queries/places';
import { cancelledMail, movedMail } from './mails';
import { releasePlaces } from './waitlist';
import { slotWithContextById } from './queries/context';
import { bookabilityOf, bookableSlot, facts, labelsOf, refuse, takeAllPlaces } from './write';

/** Once reception has checked an item in, the booking is the desk's to change, not the visitor's link. */
async function assertNotArrived(tx: Tx, bookingId: number) {
  const items = await itemStatuses(tx, bookingId);
  if (items.some((i) => i.status !== 'booked'))
    throw new HttpError(
      409,
      'checked-in',
      'You have already checked in at reception. Ask at the desk to change anything.',
    );
}

export async function cancelBooking(ctx: AppContext, bookingId: number) {
  await withDeadlockRetry(() =>
    ctx.database.db.transaction(async (tx) => {
      const b = await lockBooking(tx, bookingId);
      if (b.status === 'cancelled') return;
      await assertNotArrived(tx, b.id);
      const row = await slotWithContextById(tx, b.slotId);
      const items = await itemsOf(tx, b.id);
      await cancelBookingRow(tx, b.id);
      await releaseSkillPlaces(tx, b.slotId, countSkills(items.map((i) => i.skill as Skill)));
      await releasePlaces(ctx, tx, b.slotId, items.length);
      if (b.visitorEmail)
        await enqueueMail(
          tx,
          cancelledMail(facts(ctx, row, { ...b, visitorEmail: b.visitorEmail }, labelsOf(items, b.language), null)),
        );
    }),
  );
  ctx.outbox.kick();
}

/** Moves a booking to another slot of the same event: the new places are taken before the old ones are freed. */
export async function moveBooking(ctx: AppContext, bookingId: number, slotId: number, manageToken: string) {
  await withDeadlockRetry(() =>
    ctx.database.db.transaction(async (tx) => {
      const b = await lockBooking(tx, bookingId);
      if (b.status !== 'confirmed') throw new HttpError(409, 'cancelled', 'This booking is cancelled.');
      if (b.slotId === slotId) return;
      await assertNotArrived(tx, b.id);
      const row = await bookableSlot(tx, slotId);
      if (row.event.id !== b.eventId)
        throw new HttpError(400, 'invalid', 'errors.invalid', {
          slotId: 'Choose a time of the same event.',
        });
      const items = await itemsOf(tx, b.id);
      const skills = items.map((i) => i.skill as Skill);
      refuse(await bookabilityOf(tx, row, skills));
      await takeAllPlaces(tx, row, skills);
      await moveBookingRow(tx, b.id, slotId);
      await releaseSkillPlaces(tx, b.slotId, countSkills(skills));
      await releasePlaces(ctx, tx, b.slotId, items.length);
      if (b.visitorEmail)
        await enqueueMail(
          tx,
          movedMail(facts(ctx, row, { ...b, visitorEmail: b.visitorEmail }, labelsOf(items, b.language), manageToken)),
        );
    }),
  );
  ctx.outbox.kick();
}
