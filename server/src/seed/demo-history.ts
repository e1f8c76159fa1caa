import { createHash } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { formatReference } from '../../../shared/booking/reference';
import { BARRIERS, type Outcome } from '../../../shared/event-day/constants';
import type { Db } from '../db/client';
import {
  bookingItems,
  bookings,
  categories,
  events,
  followUps,
  itemOutcomes,
  knowledgeEntries,
  repairGroups,
  salvageParts,
  shifts,
  slots,
  users,
  venues,
} from '../db/schema/index';
import { refreshEventCells } from '../features/impact/queries/cells';
import { FIRST, ITEMS, LAST } from './demo-history-data';

/**
 * A year of past sessions with invented visitors and outcomes, so the impact dashboard, the public page, the
 * exports and the parts follow-up list have something to show. Deterministic: the same seed every time.
 */
function prng(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function pickOutcome(r: number): Outcome | null {
  if (r < 0.55) return 'fixed';
  if (r < 0.67) return 'parts-needed';
  if (r < 0.8) return 'advice';
  if (r < 0.95) return 'end-of-life';
  return null;
}

export async function seedHistory(tx: Db, now: Date) {
  const rand = prng(20260314);
  const notesLeft = new Map(ITEMS.map((spec) => [spec, [...spec.notes]]));
  const cats = new Map((await tx.select().from(categories)).map((c) => [c.slug, c]));
  const people = await tx.select().from(users);
  const who = (email: string) => people.find((p) => p.email === email)!.id;
  const plan = [
    {
      venue: 'Tanner’s Yard Hall',
      title: 'Kestlebridge monthly repairs',
      months: 12,
      items: [10, 16],
      team: [
        'fixer@example.org',
        'wren.ashcombe@example.org',
        'idris.pellow@example.org',
        'hester.mayle@example.org',
        'host@example.org',
      ],
    },
    {
      venue: 'Old School Library',
      title: 'Orrin Vale fixing evening',
      months: 6,
      items: [6, 10],
      team: ['organiser@example.org', 'cosmo.brightwater@example.org'],
    },
  ];
  const eventIds: number[] = [];
  let refBytes = 1;
  for (const p of plan) {
    const [venue] = await tx.select().from(venues).where(eq(venues.name, p.venue));
    const [group] = await tx.select().from(repairGroups).where(eq(repairGroups.id, venue.groupId));
    for (let m = p.months; m >= 1; m--) {
      const start = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() - m, 12, 10));
      const end = new Date(start.getTime() + 3 * 3600_000);
      const [{ id: eventId }] = await tx
        .insert(events)
        .values({
          groupId: group.id,
          venueId: venue.id,
          title: p.title,
          description: 'A past session.',
          startsAt: start,
          endsAt: end,
          slotMinutes: 180,
          slotCapacity: 20,
          skillLimits: {},
          status: 'closed',
          publishedAt: new Date(start.getTime() - 20 * 86400_000),
          thankYouSentAt: new Date(end.getTime() + 2 * 3600_000),
        })
        .$returningId();
      eventIds.push(eventId);
      const [{ id: slotId }] = await tx
        .insert(slots)
        .values({ eventId, startsAt: start, endsAt: end, capacity: 20, booked: 0 })
        .$returningId();
      await tx
        .insert(shifts)
        .values(
          p.team
            .filter((e) => people.some((x) => x.email === e))
            .map((e) => ({ eventId, userId: who(e), coming: true, startsAt: start, endsAt: end })),
        );
      const n = p.items[0] + Math.floor(rand() * (p.items[1] - p.items[0] + 1));
      for (let i = 0; i < n; i++) {
        const spec = ITEMS[Math.floor(rand() * ITEMS.length)];
        const cat = cats.get(spec.slug)!;
        const name = `${FIRST[Math.floor(rand() * FIRST.length)]} ${LAST[Math.floor(rand() * LAST.length)]}`;
        const reference = formatReference(createHash('sha256').update(`history-${refBytes++}`).digest());
        const [{ id: bookingId }] = await tx
          .insert(bookings)
          .values({
            reference,
            eventId,
            slotId,
            visitorName: name,
            visitorEmail: `${name.split(' ')[0].toLowerCase()}.${refBytes}@example.org`,
            manageTokenHash: createHash('sha256').update(reference).digest('hex'),
            consentAt: start,
            walkIn: rand() < 0.2,
          })
          .$returningId();
        const weighed = rand() < 0.3 ? Math.round(cat.avgWeightKg * (0.7 + rand() * 0.6) * 100) / 100 : null;
        const [{ id: itemId }] = await tx
          .insert(bookingItems)
          .values({
            bookingId,
            categoryId: cat.id,
            brand: spec.brand ?? null,
            fault: spec.fault,
            mains: Boolean(cat.mains),
            position: 0,
            status: 'done',
            weighedKg: weighed,
            checkedInAt: start,
            startedAt: start,
            doneAt: end,
          })
          .$returningId();
        const outcome = pickOutcome(rand());
        if (outcome) {
          await tx.insert(itemOutcomes).values({
            itemId,
            outcome,
            barrier: outcome === 'end-of-life' ? BARRIERS[Math.floor(rand() * BARRIERS.length)] : null,
            partDescription: outcome === 'parts-needed' ? spec.part : null,
            partCostCents: outcome === 'parts-needed' ? 300 + Math.floor(rand() * 3000) : null,
            minutes: 10 + Math.floor(rand() * 50),
            notes: rand() < 0.6 ? (notesLeft.get(spec)!.shift() ?? null) : null,
            recordedBy: who(p.team[0]),
            recordedAt: end,
          });
          const [o] = await tx.select().from(itemOutcomes).where(eq(itemOutcomes.itemId, itemId));
          if (o.notes)
            await tx.insert(knowledgeEntries).values({
              itemId,
              groupId: group.id,
              categoryId: cat.id,
              brand: spec.brand ?? '',
              model: '',
              outcome,
              symptom: spec.fault,
              notes: o.notes,
              measured: '',
              faultyPart: outcome === 'fixed' || outcome === 'parts-needed' ? spec.part : '',
              fix: '',
              eventDate: start,
            });
        }
        if (outcome === 'parts-needed') {
          // The last three months' parts are still being followed up; older ones ended one way or the other.
          const recent = m <= 3;
          await tx.insert(followUps).values({
            itemId,
            groupId: group.id,
            status: recent ? (rand() < 0.5 ? 'open' : 'part-ordered') : 'gave-up',
            createdAt: end,
            mailedAt: end,
            remindedAt: recent && m < 3 ? null : new Date(end.getTime() + 43 * 86400_000),
          });
        }
      }
      await tx.update(slots).set({ booked: n }).where(eq(slots.id, slotId));
    }
  }
  await refreshEventCells(tx, eventIds);
  // Kestlebridge shares its notes; its boxes hold a few saved parts.
  const [k] = await tx.select().from(repairGroups).where(eq(repairGroups.slug, 'kestlebridge-menders'));
  await tx.update(repairGroups).set({ shareKnowledge: true }).where(eq(repairGroups.id, k.id));
  await tx.insert(salvageParts).values([
    {
      groupId: k.id,
      type: 'bipolar-transistor',
      value: 'NPN switching transistor 400 V 4 A',
      ratings: { polarity: 'NPN', voltageV: 400, currentA: 4, powerW: 75 },
      package: 'TO-220',
      pinout: 'BCE',
      quantity: 2,
      box: 'Box 2 · semiconductors',
      notes: 'From a dead desk lamp power supply.',
    },
    {
      groupId: k.id,
      type: 'capacitor',
      value: '2200 µF 25 V electrolytic, 105 °C',
      ratings: { capacitanceF: 0.0022, voltageV: 25 },
      package: 'radial',
      quantity: 3,
      box: 'Box 1 · capacitors',
    },
    {
      groupId: k.id,
      type: 'fuse',
      value: '13 A ceramic plug fuse',
      ratings: { currentA: 13, voltageV: 240 },
      quantity: 6,
      box: 'Fuse tin',
    },
    {
      groupId: k.id,
      type: 'fuse',
      value: '3 A ceramic plug fuse',
      ratings: { currentA: 3, voltageV: 240 },
      quantity: 4,
      box: 'Fuse tin',
    },
    {
      groupId: k.id,
      type: 'thermal-cutout',
      value: 'Thermal cut-out 240 °C 10 A',
      ratings: { temperatureC: 240, currentA: 10, voltageV: 250 },
      package: 'axial',
      quantity: 1,
      box: 'Box 4 · heating parts',
    },
    {
      groupId: k.id,
      type: 'resistor',
      value: '1 Ω 5 W wirewound',
      ratings: { resistanceOhm: 1, powerW: 5, tolerancePct: 5 },
      package: 'axial',
      quantity: 2,
      box: 'Box 3 · resistors',
    },
    {
      groupId: k.id,
      type: 'motor',
      value: 'Small DC motor 3 V',
      ratings: { voltageV: 3 },
      quantity: 2,
      box: 'Box 5 · motors',
    },
  ]);
}
