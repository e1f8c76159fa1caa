import { randomBytes } from 'node:crypto';
import { categoryText } from '../../i18n';
import { DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';
import {
  BARRIER_LABELS,
  canMoveTo,
  ITEM_STATUS_LABELS,
  mayStartRepair,
  OUTCOME_LABELS,
  type ItemStatus,
} from '../../../../shared/event-day/constants';
import { formatTagCode, shortName } from '../../../../shared/event-day/tag-code';
import { cautionsFor, HEATING_CATEGORY_SLUGS, LOCAL_RULES_PREVAIL } from '../../../../shared/safety/cautions';
import { SAFETY_SOURCE } from '../../../../shared/safety/limits';
import type { ItemView } from '../../../../shared/api/event-day';
import type { SessionUser } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import type { Tx } from '../../db/client';
import { hasGroupRole } from '../../auth/guards';
import { GROUP_ROLES_FOR } from '../../../../shared/permissions';
import { HttpError } from '../../http/errors';
import { loadItem, partsUsed } from '../../core/items';
import * as q from './queries/items';

/** Moves items to a status the transition table allows, writing one history row each with the time and who did it. */
export async function setStatus(
  tx: Tx,
  changes: { itemId: number; from: ItemStatus | null; to: ItemStatus; extra?: q.ItemChanges }[],
  byUserId: number | null,
  note?: string,
) {
  for (const c of changes) {
    if (c.from !== null && !canMoveTo(c.from, c.to))
      throw new HttpError(409, 'bad-transition', 'problems.itemCannotMove', undefined, {
        from: `fixer.status.${c.from}`,
        to: `fixer.status.${c.to}`,
      });
    await q.updateItemStatus(tx, c.itemId, c.to, c.extra);
  }
  if (changes.length)
    await q.insertStatusChanges(
      tx,
      changes.map((c) => ({ itemId: c.itemId, fromStatus: c.from, toStatus: c.to, byUserId, note: note ?? null })),
    );
}

/** The event's next queue numbers, taken under its row lock (the caller's transaction holds it until commit). */
export async function nextQueueNumbers(tx: Tx, eventId: number, n: number): Promise<number[]> {
  return n === 0 ? [] : q.takeQueueNumbers(tx, eventId, n);
}

/** Fresh tag codes, checked against those already issued (the unique index is the final guard). */
export async function newTagCodes(tx: Tx, n: number): Promise<string[]> {
  if (n === 0) return [];
  for (let attempt = 0; attempt < 5; attempt++) {
    const codes = [...new Set(Array.from({ length: n }, () => formatTagCode(randomBytes(5))))];
    if (codes.length < n) continue;
    if ((await q.tagCodesTaken(tx, codes)).length === 0) return codes;
  }
  throw new Error('Could not find free tag codes.');
}

export const isHeating = (slug: string) => (HEATING_CATEGORY_SLUGS as readonly string[]).includes(slug);

/** The item page: fixers see the visitor's first name and initial only; reception and organisers see the name and phone. */
export async function itemView(
  ctx: AppContext,
  itemId: number,
  user: SessionUser,
  lang: Language = DEFAULT_LANGUAGE,
): Promise<ItemView> {
  const { db } = ctx.database;
  const row = await loadItem(db, itemId);
  const [placement, outcome, checks, history, photos] = await Promise.all([
    q.placementOf(db, itemId),
    q.outcomeOf(db, itemId),
    q.checksOf(db, itemId),
    q.historyOf(db, itemId),
    q.photosOf(db, itemId),
  ]);
  const used = await partsUsed(db, itemId);
  const { item, booking, slot, event, group, category } = row;
  const staff = hasGroupRole(user, group.id, ['organiser', 'host']);
  const organiser = hasGroupRole(user, group.id, ['organiser']);
  const heating = isHeating(category.slug);
  const mains = Boolean(item.mains);
  const mine = placement?.userId === user.id;
  const fixerHere = hasGroupRole(user, group.id, ['fixer']);
  return {
    id: item.id,
    status: item.status,
    statusLabel: ITEM_STATUS_LABELS[item.status],
    tagCode: item.tagCode,
    queueNumber: item.queueNumber,
    categoryId: category.id,
    categoryName: categoryText(lang, category.slug, 'name', category.name),
    skill: category.skill,
    mains,
    battery: Boolean(item.battery),
    heating,
    brand: item.brand,
    model: item.model,
    ageYears: item.ageYears,
    fault: item.fault,
    weighedKg: item.weighedKg,
    estimatedMinutes: category.repairMinutes,
    checkedInAt: item.checkedInAt,
    startedAt: item.startedAt,
    doneAt: item.doneAt,
    photos,
    booking: {
      reference: booking.reference,
      visitorName: staff ? booking.visitorName : shortName(booking.visitorName),
      visitorPhone: staff ? booking.visitorPhone : null,
      walkIn: Boolean(booking.walkIn),
      slotStartsAt: slot.startsAt,
      slotEndsAt: slot.endsAt,
    },
    event: {
      id: event.id,
      title: event.title,
      groupId: group.id,
      groupName: group.name,
      timeZone: group.timeZone,
      currency: group.currency,
      startsAt: event.startsAt,
      endsAt: event.endsAt,
    },
    placement: placement ?? null,
    outcome: outcome
      ? {
          ...outcome.o,
          outcomeLabel: OUTCOME_LABELS[outcome.o.outcome],
          barrierLabel: outcome.o.barrier ? BARRIER_LABELS[outcome.o.barrier] : null,
          partCost: outcome.o.partCostCents === null ? null : outcome.o.partCostCents / 100,
          recordedByName: outcome.byName,
        }
      : null,
    safetyChecks: checks.map(({ c, byName }) => ({
      id: c.id,
      pass: Boolean(c.pass),
      failures: c.failures,
      applianceClass: c.applianceClass,
      readings: c.readings,
      instrument: c.instrument,
      createdAt: c.createdAt,
      checkedByName: byName,
    })),
    history: history.map(({ h, byName }) => ({
      from: h.fromStatus,
      to: h.toStatus,
      toLabel: ITEM_STATUS_LABELS[h.toStatus],
      at: h.createdAt,
      byName,
      note: h.note,
    })),
    partsUsed: used,
    returnOfItemId: item.returnOfItemId,
    cautions: cautionsFor({ mains, battery: Boolean(item.battery), heating }),
    safetyNote: LOCAL_RULES_PREVAIL,
    safetySource: SAFETY_SOURCE,
    can: {
      start: mayStartRepair(item.status) && hasGroupRole(user, group.id, GROUP_ROLES_FOR.benchWork),
      record: organiser || (fixerHere && (!placement || mine)),
    },
  };
}
