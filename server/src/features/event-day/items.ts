import { randomBytes } from 'node:crypto';
import { asc, desc, eq, inArray } from 'drizzle-orm';
import {
  ITEM_STATUS_LABELS,
  OUTCOME_LABELS,
  BARRIER_LABELS,
  canMoveTo,
  isOpen,
  mayStartRepair,
  type ItemStatus,
} from '../../../../shared/event-day/constants';
import { formatTagCode, shortName } from '../../../../shared/event-day/tag-code';
import { cautionsFor, HEATING_CATEGORY_SLUGS, LOCAL_RULES_PREVAIL } from '../../../../shared/safety/cautions';
import { SAFETY_SOURCE } from '../../../../shared/safety/limits';
import type { ItemView } from '../../../../shared/api/event-day';
import type { SessionUser } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import type { Tx } from '../../db/client';
import {
  bookingItems,
  eventBenches,
  events,
  itemAssignments,
  itemOutcomes,
  itemPhotos,
  itemStatusChanges,
  safetyChecks,
  users,
} from '../../db/schema/index';
import { hasGroupRole } from '../../auth/guards';
import { HttpError } from '../../http/errors';
import { loadItem, partsUsed } from '../../core/items';

/** Moves items to a status, writing one history row each with the time and who did it. */
export async function setStatus(
  tx: Tx,
  changes: {
    itemId: number;
    from: ItemStatus | null;
    to: ItemStatus;
    extra?: Partial<typeof bookingItems.$inferInsert>;
  }[],
  byUserId: number | null,
  note?: string,
) {
  for (const c of changes) {
    if (c.from !== null && !canMoveTo(c.from, c.to))
      throw new HttpError(
        409,
        'bad-transition',
        `An item that is ${ITEM_STATUS_LABELS[c.from].toLowerCase()} cannot become ${ITEM_STATUS_LABELS[c.to].toLowerCase()}.`,
      );
    await tx
      .update(bookingItems)
      .set({ status: c.to, ...c.extra })
      .where(eq(bookingItems.id, c.itemId));
  }
  if (changes.length)
    await tx
      .insert(itemStatusChanges)
      .values(
        changes.map((c) => ({ itemId: c.itemId, fromStatus: c.from, toStatus: c.to, byUserId, note: note ?? null })),
      );
}

/** Takes the event's next queue number under its row lock (the caller's transaction holds it until commit). */
export async function nextQueueNumbers(tx: Tx, eventId: number, n: number): Promise<number[]> {
  if (n === 0) return [];
  const [e] = await tx
    .select({ counter: events.queueCounter })
    .from(events)
    .where(eq(events.id, eventId))
    .for('update');
  await tx
    .update(events)
    .set({ queueCounter: e.counter + n })
    .where(eq(events.id, eventId));
  return Array.from({ length: n }, (_, i) => e.counter + 1 + i);
}

/** Fresh tag codes, checked against those already issued (the unique index is the final guard). */
export async function newTagCodes(tx: Tx, n: number): Promise<string[]> {
  for (let attempt = 0; attempt < 5; attempt++) {
    const codes = [...new Set(Array.from({ length: n }, () => formatTagCode(randomBytes(5))))];
    if (codes.length < n) continue;
    const taken = await tx
      .select({ code: bookingItems.tagCode })
      .from(bookingItems)
      .where(inArray(bookingItems.tagCode, codes));
    if (taken.length === 0) return codes;
  }
  throw new Error('Could not find free tag codes.');
}

export const isHeating = (slug: string) => (HEATING_CATEGORY_SLUGS as readonly string[]).includes(slug);

/** The item page: fixers see the visitor's first name and initial only; reception and organisers see the name and phone. */
export async function itemView(ctx: AppContext, itemId: number, user: SessionUser): Promise<ItemView> {
  const { db } = ctx.database;
  const row = await loadItem(db, itemId);
  const [placement] = await db
    .select({
      userId: itemAssignments.userId,
      benchId: itemAssignments.benchId,
      fixerName: users.name,
      benchName: eventBenches.name,
      startsAt: itemAssignments.startsAt,
    })
    .from(itemAssignments)
    .innerJoin(users, eq(users.id, itemAssignments.userId))
    .innerJoin(eventBenches, eq(eventBenches.id, itemAssignments.benchId))
    .where(eq(itemAssignments.itemId, itemId));
  const [outcome] = await db
    .select({ o: itemOutcomes, byName: users.name })
    .from(itemOutcomes)
    .leftJoin(users, eq(users.id, itemOutcomes.recordedBy))
    .where(eq(itemOutcomes.itemId, itemId));
  const checks = await db
    .select({ c: safetyChecks, byName: users.name })
    .from(safetyChecks)
    .leftJoin(users, eq(users.id, safetyChecks.checkedBy))
    .where(eq(safetyChecks.itemId, itemId))
    .orderBy(desc(safetyChecks.id));
  const history = await db
    .select({ h: itemStatusChanges, byName: users.name })
    .from(itemStatusChanges)
    .leftJoin(users, eq(users.id, itemStatusChanges.byUserId))
    .where(eq(itemStatusChanges.itemId, itemId))
    .orderBy(asc(itemStatusChanges.id));
  const photos = await db
    .select({ id: itemPhotos.id, kind: itemPhotos.kind, width: itemPhotos.width, height: itemPhotos.height })
    .from(itemPhotos)
    .where(eq(itemPhotos.itemId, itemId));
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
    categoryName: category.name,
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
      start: isOpen(item.status) && mayStartRepair(item.status) && (organiser || fixerHere),
      record: organiser || (fixerHere && (!placement || mine)),
    },
  };
}
