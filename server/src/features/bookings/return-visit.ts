import type { AppContext } from '../../context';
import { HttpError, notFound } from '../../http/errors';
import { asLanguage, DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';
import { categoryText } from '../../i18n';
import { runHooks } from '../../core/hooks';
import { itemOfRebookToken } from '../../core/links';
import { createReturnBooking } from './service';
import { followUpWithItem, nextSessions, slotsStillAhead } from './queries/return-visit';

/** The return visit of an item waiting for a part, booked through the priority link in the follow-up mail. */
async function rebookContext(ctx: AppContext, token: string) {
  const r = await followUpWithItem(ctx.database.db, itemOfRebookToken(ctx, token));
  if (!r) throw notFound('That link');
  return r;
}

/** What the re-booking page shows (the kind of item in the reader's language): the item, the part, and the group's next sessions with their times. */
export async function rebookView(ctx: AppContext, token: string, lang: Language = DEFAULT_LANGUAGE) {
  const r = await rebookContext(ctx, token);
  const upcoming = await nextSessions(ctx.database.db, r.group.id, 3);
  const slotRows = await slotsStillAhead(
    ctx.database.db,
    upcoming.map((e) => e.id),
  );
  return {
    item: {
      categoryName: categoryText(lang, r.category.slug, 'name', r.category.name),
      brand: r.item.brand,
      model: r.item.model,
      part: r.part,
    },
    visitorName: r.booking.visitorName.split(' ')[0],
    group: { name: r.group.name, timeZone: r.group.timeZone },
    status: r.f.status,
    booked: r.f.returnItemId !== null,
    events: upcoming.map((e) => ({
      id: e.id,
      title: e.title,
      startsAt: e.startsAt,
      endsAt: e.endsAt,
      // One place over capacity is kept for returns.
      slots: slotRows
        .filter((s) => s.eventId === e.id)
        .map((s) => ({
          id: s.id,
          startsAt: s.startsAt,
          endsAt: s.endsAt,
          free: Math.max(0, s.capacity + 1 - s.booked - s.held),
        })),
    })),
  };
}

/** Books the return visit: the visitor and item as before, marked as continuing the earlier visit. */
export async function rebook(ctx: AppContext, token: string, slotId: number) {
  const r = await rebookContext(ctx, token);
  if (r.f.returnItemId !== null)
    throw new HttpError(
      409,
      'already-booked',
      'A return visit is already booked for this item. Use the link in its confirmation mail to change it.',
    );
  if (!['open', 'part-ordered'].includes(r.f.status))
    throw new HttpError(409, 'closed', 'This follow-up is closed. Ask the group if you still want to come back.');
  if (!r.booking.visitorEmail)
    throw new HttpError(
      409,
      'no-email',
      'This visit has no e-mail address to confirm to. Come to reception on the day instead.',
    );
  // Only a time the re-booking page offers: one of this group's next sessions, never another group's slot.
  const offered = await slotsStillAhead(
    ctx.database.db,
    (await nextSessions(ctx.database.db, r.group.id, 3)).map((e) => e.id),
  );
  if (!offered.some((s) => s.id === slotId))
    throw new HttpError(409, 'not-offered', `Choose one of the times ${r.group.name} offers on this page.`, {
      slotId: 'Choose one of the times listed on this page.',
    });
  const fault = `Return visit with the part${r.part ? ` (${r.part})` : ''}. Before: ${r.item.fault}`.slice(0, 2000);
  const result = await createReturnBooking(
    ctx,
    {
      slotId,
      visitor: {
        name: r.booking.visitorName,
        email: r.booking.visitorEmail,
        phone: r.booking.visitorPhone ?? undefined,
      },
      items: [
        {
          categoryId: r.item.categoryId,
          brand: r.item.brand ?? undefined,
          model: r.item.model ?? undefined,
          fault,
          mains: Boolean(r.item.mains),
          battery: Boolean(r.item.battery),
          hazards: [],
        },
      ],
      consent: true,
    },
    r.item.id,
    // The return visit is mailed in the language of the visit it continues.
    asLanguage(r.booking.language),
    async (tx, b) => runHooks(ctx.hooks.returnBooked, tx, { earlierItemId: r.item.id, returnItemId: b.itemIds[0] }),
  );
  return { reference: result.reference, manageToken: result.manageToken, eventId: result.eventId };
}
