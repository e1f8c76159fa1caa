import { createHash, createHmac } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { generateSlots } from '../../../shared/booking/slots';
import type { ItemStatus } from '../../../shared/event-day/constants';
import type { Db } from '../db/client';
import { refreshEventCells } from '../features/impact/queries/cells';
import {
  bookingItems,
  bookings,
  categories,
  eventBenches,
  events,
  itemAssignments,
  itemOutcomes,
  itemStatusChanges,
  repairGroups,
  safetyChecks,
  shifts,
  slots,
  users,
  venueBenches,
  venues,
} from '../db/schema/index';

/**
 * A session running now at Tanner's Yard Hall, so reception, the benches, the hall display and the live view have
 * something to show on first start: one item done (with its safety check), one at a bench, one waiting since
 * long ago, and visitors still to come. Invented people and items.
 */
const TODAY_VISITORS: {
  ref: string;
  name: string;
  slot: number;
  slug: string;
  brand?: string;
  fault: string;
  state: ItemStatus;
  minutesAgo?: number;
  fixer?: string;
  bench?: string;
}[] = [
  {
    ref: 'T2D-4KX',
    name: 'Sol Marchetti',
    slot: 0,
    slug: 'kettle',
    brand: 'Brewmaster',
    fault: 'Does not switch off when it boils.',
    state: 'done',
    minutesAgo: 55,
    fixer: 'fixer@example.org',
    bench: 'Mains bench',
  },
  {
    ref: 'T3H-7PQ',
    name: 'Ada Fenwick',
    slot: 0,
    slug: 'clothing',
    fault: 'Lining of a wool coat torn at the armpit.',
    state: 'at-bench',
    minutesAgo: 50,
    fixer: 'wren.ashcombe@example.org',
    bench: 'Sewing table',
  },
  {
    ref: 'T4M-8RS',
    name: 'Tobias Rook',
    slot: 1,
    slug: 'toaster',
    fault: 'Lever will not stay down.',
    state: 'waiting',
    minutesAgo: 48,
    fixer: 'fixer@example.org',
    bench: 'Mains bench',
  },
  {
    ref: 'T5N-9WZ',
    name: 'Priya Anand',
    slot: 2,
    slug: 'laptop',
    brand: 'Nimbus',
    fault: 'Fan roars and it shuts down when warm.',
    state: 'booked',
  },
  {
    ref: 'T6P-2XC',
    name: 'Cass Dunmore',
    slot: 2,
    slug: 'lamp',
    fault: 'Standard lamp flickers when the shade is touched.',
    state: 'booked',
  },
  {
    ref: 'T7Q-3YD',
    name: 'Lio Brandt',
    slot: 3,
    slug: 'radio-hifi',
    brand: 'Harrowgate',
    fault: 'Hums loudly on every station.',
    state: 'booked',
  },
  {
    ref: 'T8R-4ZE',
    name: 'Mae Okafor',
    slot: 4,
    slug: 'electric-toy',
    fault: 'Talking bear stopped talking after new batteries.',
    state: 'booked',
  },
];
export const TODAY_TITLE = 'Kestlebridge drop-in session';
const TAGS = ['KD2A7', 'KD3B8', 'KD4C9'];

export async function seedToday(tx: Db, now: Date, linkSecret: string) {
  const [hall] = await tx.select().from(venues).where(eq(venues.name, 'Tanner’s Yard Hall'));
  const [group] = await tx.select().from(repairGroups).where(eq(repairGroups.id, hall.groupId));
  const halfHour = 30 * 60_000;
  const start = new Date(Math.floor(now.getTime() / halfHour) * halfHour - 2 * halfHour);
  const end = new Date(start.getTime() + 4 * 3600_000);
  const [{ id: eventId }] = await tx
    .insert(events)
    .values({
      groupId: group.id,
      venueId: hall.id,
      title: TODAY_TITLE,
      description: 'A drop-in session: book a time, or come along and queue at reception.',
      startsAt: start,
      endsAt: end,
      slotMinutes: 30,
      slotCapacity: 4,
      skillLimits: {},
      status: 'published',
      publishedAt: new Date(now.getTime() - 20 * 86400_000),
      queueCounter: 3,
    })
    .$returningId();
  await tx.insert(slots).values(generateSlots(start, end, 30, 4).map((s) => ({ eventId, ...s })));
  const slotRows = await tx.select().from(slots).where(eq(slots.eventId, eventId)).orderBy(slots.startsAt);
  const layout = await tx.select().from(venueBenches).where(eq(venueBenches.venueId, hall.id));
  await tx
    .insert(eventBenches)
    .values(
      layout.map((b) => ({ eventId, name: b.name, seats: b.seats, equipment: b.equipment, position: b.position })),
    );
  const benches = await tx.select().from(eventBenches).where(eq(eventBenches.eventId, eventId));
  const people = await tx.select().from(users);
  const who = (email: string) => people.find((p) => p.email === email)!.id;
  await tx.insert(shifts).values(
    ['fixer@example.org', 'wren.ashcombe@example.org', 'idris.pellow@example.org'].map((e) => ({
      eventId,
      userId: who(e),
      coming: true,
      startsAt: start,
      endsAt: end,
    })),
  );
  const cats = new Map((await tx.select().from(categories)).map((c) => [c.slug, c]));
  const host = who('host@example.org');
  const ago = (m: number) => new Date(now.getTime() - m * 60_000);
  let n = 0;
  for (const v of TODAY_VISITORS) {
    const token = createHmac('sha256', linkSecret).update(`manage-booking:${v.ref}`).digest('base64url');
    const slot = slotRows[v.slot];
    const cat = cats.get(v.slug)!;
    const [{ id: bookingId }] = await tx
      .insert(bookings)
      .values({
        reference: v.ref,
        eventId,
        slotId: slot.id,
        visitorName: v.name,
        visitorEmail: `${v.name.split(' ')[0].toLowerCase()}@example.org`,
        manageTokenHash: createHash('sha256').update(token).digest('hex'),
        consentAt: ago(14 * 24 * 60),
      })
      .$returningId();
    await tx
      .update(slots)
      .set({ booked: slot.booked + 1 })
      .where(eq(slots.id, slot.id));
    slot.booked += 1;
    const arrived = v.state !== 'booked';
    const [{ id: itemId }] = await tx
      .insert(bookingItems)
      .values({
        bookingId,
        categoryId: cat.id,
        brand: v.brand ?? null,
        fault: v.fault,
        mains: Boolean(cat.mains),
        position: 0,
        status: v.state,
        ...(arrived ? { tagCode: TAGS[n], queueNumber: n + 1, checkedInAt: ago(v.minutesAgo!) } : {}),
        ...(v.state === 'at-bench' || v.state === 'done' ? { startedAt: ago(v.minutesAgo! - 5) } : {}),
        ...(v.state === 'done' ? { doneAt: ago(v.minutesAgo! - 30), weighedKg: 1.1 } : {}),
      })
      .$returningId();
    if (!arrived) continue;
    n++;
    const fixer = who(v.fixer!);
    const benchId = benches.find((b) => b.name === v.bench)!.id;
    await tx.insert(itemAssignments).values({
      itemId,
      eventId,
      userId: fixer,
      benchId,
      startsAt: ago(v.minutesAgo! - 5),
      locked: v.state !== 'waiting',
      source: 'hand',
    });
    const steps: [ItemStatus | null, ItemStatus, number, number][] = [
      [null, 'checked-in', v.minutesAgo!, host],
      ['checked-in', 'waiting', v.minutesAgo! - 1, host],
    ];
    if (v.state === 'at-bench' || v.state === 'done') steps.push(['waiting', 'at-bench', v.minutesAgo! - 5, fixer]);
    if (v.state === 'done') steps.push(['at-bench', 'done', v.minutesAgo! - 30, fixer]);
    await tx.insert(itemStatusChanges).values(
      steps.map(([from, to, m, by]) => ({
        itemId,
        fromStatus: from ?? 'booked',
        toStatus: to,
        byUserId: by,
        createdAt: ago(m),
      })),
    );
    if (v.state === 'done') {
      const readings = {
        visual: { cord: true, plug: true, strainRelief: true, casing: true, noHeatDamage: true },
        applianceClass: 'I' as const,
        heating: true,
        cordLengthM: 0.75,
        protectiveConductorOhm: 0.09,
        insulationMOhm: 52,
        instrument: 'Group appliance tester',
      };
      const [{ id: checkId }] = await tx
        .insert(safetyChecks)
        .values({
          itemId,
          applianceClass: 'I',
          readings,
          instrument: readings.instrument,
          pass: true,
          failures: [],
          checkedBy: fixer,
          createdAt: ago(v.minutesAgo! - 28),
        })
        .$returningId();
      await tx.insert(itemOutcomes).values({
        itemId,
        outcome: 'fixed',
        minutes: 25,
        notes: 'Steam switch bimetal disc stuck; cleaned the lever linkage and re-seated the disc.',
        safetyCheckId: checkId,
        recordedBy: fixer,
        recordedAt: ago(v.minutesAgo! - 30),
      });
    }
  }
  await refreshEventCells(tx, [eventId]);
}
