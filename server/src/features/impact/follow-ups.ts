import type { Outcome } from '../../../../shared/event-day/constants';
import type { FollowUp } from '../../../../shared/api/impact';
import { formatMoney } from '../../../../shared/format';
import { isWebLink } from '../../../../shared/files/web-links';
import { groupById } from './queries/stats';
import {
  FOLLOW_UP_LABELS,
  FOLLOW_UP_REMINDER_DAYS,
  reminderDue,
  type FollowUpStatus,
} from '../../../../shared/impact/follow-ups';
import type { AppContext } from '../../context';
import type { DbOrTx, Tx } from '../../db/client';
import { HttpError, notFound } from '../../http/errors';
import { enqueueMail } from '../../mail/outbox';
import { categoryText, translate } from '../../i18n';
import { asLanguage, type Language } from '../../../../shared/i18n/languages';
import { composeMail } from '../../mail/templates';
import type { ItemRow } from '../../core/items';
import { rebookUrl } from '../../core/links';
import { itemLabel } from '../../../../shared/item-label';
import {
  dropOpenFollowUp,
  findFollowUp,
  followUpGroupId as groupOfFollowUp,
  followUpRows,
  markCameBackRow,
  markMailed,
  markRebookedRow,
  markReminded,
  moveOn,
  openFollowUp,
  outcomeOf,
  remindersDue,
  returnsAmong,
  updateFollowUpStatus,
} from './queries/follow-ups';

/** The part mail in the visitor's language (the booking's): its words from the 'mail' namespace. */
function partMail(
  ctx: AppContext,
  to: string,
  f: {
    visitorName: string;
    groupName: string;
    categorySlug: string;
    categoryName: string;
    part: string;
    link: string | null;
    cost: number | null;
    currency: string;
    itemId: number;
    language: string | null;
  },
  reminder: boolean,
) {
  const lang = asLanguage(f.language);
  const name = categoryText(lang, f.categorySlug, 'name', f.categoryName);
  // Inside a sentence a kind of item is lower case, but in German, whose nouns keep their capital.
  const kind = lang === 'de' ? name : name.toLowerCase();
  const t = (key: string, values?: Record<string, unknown>) => translate(lang, `mail.part.${key}`, values);
  return composeMail(to, reminder ? t('subjectReminder', { kind: name }) : t('subject', { kind }), {
    language: lang,
    paragraphs: [
      translate(lang, 'mail.hello', { name: f.visitorName.split(' ')[0] }),
      reminder ? t('reminder', { group: f.groupName, kind }) : t('thanks', { group: f.groupName, kind }),
      [
        t('part', { part: f.part }),
        ...(isWebLink(f.link) ? [t('where', { link: f.link })] : []),
        ...(f.cost !== null ? [t('cost', { cost: formatMoney(f.cost, f.currency, lang) })] : []),
      ].join(' '),
      t('book'),
    ],
    action: { label: t('action'), url: rebookUrl(ctx, f.itemId) },
    footnote: t('footnote'),
  });
}

/**
 * After an outcome: a part needed opens (or keeps) the follow-up and mails the visitor; a return visit moves the
 * earlier item's follow-up on; a corrected outcome that needs no part closes its follow-up.
 */
export async function afterOutcome(ctx: AppContext, tx: Tx, row: ItemRow, outcome: Outcome) {
  const itemId = row.item.id;
  if (outcome === 'parts-needed') {
    const existing = await findFollowUp(tx, itemId);
    if (!existing) {
      await openFollowUp(tx, itemId, row.group.id);
      const o = await outcomeOf(tx, itemId);
      if (row.booking.visitorEmail && o?.partDescription) {
        await enqueueMail(
          tx,
          partMail(
            ctx,
            row.booking.visitorEmail,
            {
              visitorName: row.booking.visitorName,
              groupName: row.group.name,
              categorySlug: row.category.slug,
              categoryName: row.category.name,
              language: row.booking.language,
              part: o.partDescription,
              link: o.partLink,
              cost: o.partCostCents === null ? null : o.partCostCents / 100,
              currency: row.group.currency,
              itemId,
            },
            false,
          ),
        );
        await markMailed(tx, itemId);
      }
    }
  } else {
    await dropOpenFollowUp(tx, itemId);
  }
  if (row.item.returnOfItemId) {
    await moveOn(tx, row.item.returnOfItemId, outcome === 'fixed' ? 'fixed-at-return' : 'came-back', itemId);
  }
}

/** A return visit checked in at the desk: its earlier item's follow-up says it came back. */
export async function markCameBack(tx: DbOrTx, itemIds: number[]) {
  if (!itemIds.length) return;
  for (const r of await returnsAmong(tx, itemIds)) await markCameBackRow(tx, r.returnOf!, r.id);
}

/** The organisers' list: every item of the group waiting for a part, oldest first, with what happened since. */
export async function listFollowUps(ctx: AppContext, groupId: number, lang: Language = 'en'): Promise<FollowUp[]> {
  const [rows, group] = await Promise.all([
    followUpRows(ctx.database.db, groupId),
    groupById(ctx.database.db, groupId),
  ]);
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
    item: itemLabel({ ...r, categoryName: categoryText(lang, r.categorySlug, 'name', r.categoryName) }),
    part: r.part,
    partLink: r.partLink,
    partCost: r.partCostCents === null ? null : r.partCostCents / 100,
    currency: group?.currency ?? 'GBP',
    visitor: { name: r.visitorName, email: r.visitorEmail, phone: r.visitorPhone, reference: r.reference },
    event: { title: r.eventTitle, startsAt: r.eventStartsAt },
    rebookUrl: ['open', 'part-ordered'].includes(r.f.status) ? rebookUrl(ctx, r.f.itemId) : null,
    returnVisit:
      r.returnReference && r.returnStartsAt
        ? { reference: r.returnReference, eventTitle: r.returnEventTitle, startsAt: r.returnStartsAt }
        : null,
  }));
}

export async function setFollowUpStatus(ctx: AppContext, itemId: number, status: FollowUpStatus, note?: string) {
  if (!(await updateFollowUpStatus(ctx.database.db, itemId, status, note))) throw notFound('That follow-up');
}

/** The group of an item's follow-up, for the role guards (0 when there is none, which the guards refuse). */
export const followUpGroupId = (ctx: AppContext, itemId: number) => groupOfFollowUp(ctx.database.db, itemId);

/**
 * A return visit was booked through the follow-up's link: the follow-up says so, once. A second return visit for
 * the same item is refused here, inside the booking's transaction, so it books nothing.
 */
export async function markRebooked(tx: Tx, e: { earlierItemId: number; returnItemId: number }) {
  if (!(await markRebookedRow(tx, e.earlierItemId, e.returnItemId)))
    throw new HttpError(409, 'already-booked', 'A return visit is already booked for this item.');
}

/** Six weeks with no news: one reminder to the visitor, with the same link. */
export async function sendFollowUpReminders(ctx: AppContext): Promise<number> {
  const cutoff = new Date(Date.now() - FOLLOW_UP_REMINDER_DAYS * 86400_000);
  const sent = await ctx.database.db.transaction(async (tx) => {
    const due = await remindersDue(tx, cutoff);
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
              categorySlug: d.categorySlug,
              categoryName: d.categoryName,
              language: d.booking.language,
              part: d.o.partDescription,
              link: d.o.partLink,
              cost: d.o.partCostCents === null ? null : d.o.partCostCents / 100,
              currency: d.currency,
              itemId: d.f.itemId,
            },
            true,
          ),
        );
      }
      await markReminded(tx, d.f.itemId);
    }
    return due.length;
  });
  if (sent) ctx.outbox.kick();
  return sent;
}
