import { eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { TZDate } from '@date-fns/tz';
import { createHash, createHmac } from 'node:crypto';
import { generateSlots } from '../../../shared/booking/slots';
import { sql } from 'drizzle-orm';
import { bookingItems, bookings, categories, events, slots, slotSkillCounts, venues } from '../db/schema/index';

/** The Saturday at least `minDays` ahead, at `hour` o'clock in the group's zone. */
function saturday(now: Date, minDays: number, hour: number, zone: string): Date {
  const base = new TZDate(now.getTime(), zone);
  const d = new TZDate(base.getFullYear(), base.getMonth(), base.getDate() + minDays, hour, 0, 0, zone);
  while (d.getDay() !== 6) d.setDate(d.getDate() + 1);
  return new Date(d.getTime());
}

const DEMO_VISITORS: {
  name: string;
  slot: number;
  items: { slug: string; brand?: string; model?: string; ageYears?: number; fault: string }[];
}[] = [
  {
    name: 'Orla Whitcombe',
    slot: 0,
    items: [
      {
        slug: 'kettle',
        brand: 'Brewmaster',
        ageYears: 4,
        fault: 'Switches itself off before the water boils; the light flickers.',
      },
    ],
  },
  {
    name: 'Dev Kanaris',
    slot: 0,
    items: [
      {
        slug: 'laptop',
        brand: 'Nimbus',
        model: 'Air 13',
        ageYears: 6,
        fault: 'Will not charge unless the cable is held at an angle.',
      },
    ],
  },
  {
    name: 'Bea Lindqvist',
    slot: 1,
    items: [
      { slug: 'clothing', fault: 'Zip of a winter coat has come off one side.' },
      { slug: 'clothing', fault: 'Hole in the knee of school trousers.' },
    ],
  },
  {
    name: 'Hamish Torrance',
    slot: 1,
    items: [
      { slug: 'lamp', ageYears: 30, fault: 'Brass desk lamp from my grandmother; no light, switch feels loose.' },
    ],
  },
  {
    name: 'Noor Haddad',
    slot: 2,
    items: [
      {
        slug: 'radio-hifi',
        brand: 'Harrowgate',
        model: 'DAB 2',
        ageYears: 8,
        fault: 'Crackles and loses the station when the volume goes up.',
      },
    ],
  },
  {
    name: 'Felix Amberley',
    slot: 2,
    items: [{ slug: 'bicycle', fault: 'Gears skip under load and the back brake rubs.' }],
  },
  { name: 'Rosa Penhallow', slot: 3, items: [{ slug: 'toaster', ageYears: 3, fault: 'One side stays cold.' }] },
  {
    name: 'Ike Olawale',
    slot: 3,
    items: [{ slug: 'electric-toy', fault: 'Remote-control car: wheels turn one way only.' }],
  },
  {
    name: 'Mira Castellane',
    slot: 4,
    items: [
      {
        slug: 'vacuum-cleaner',
        brand: 'Tempest',
        ageYears: 5,
        fault: 'Very loud and smells of burning after a minute.',
      },
    ],
  },
];

export async function seedEvents(tx: Db, groupIds: Record<string, number>, now: Date, linkSecret: string) {
  const zone = 'Europe/London';
  const [kVenue] = await tx.select().from(venues).where(eq(venues.groupId, groupIds['kestlebridge-menders']));
  const [oVenue] = await tx.select().from(venues).where(eq(venues.groupId, groupIds['orrin-vale-fixing-circle']));
  const plan = [
    {
      groupId: groupIds['kestlebridge-menders'],
      venueId: kVenue.id,
      title: 'Kestlebridge repair session',
      start: saturday(now, 5, 10, zone),
      hours: 3,
      slotMinutes: 30,
      capacity: 4,
      skillLimits: { textiles: 2 },
      status: 'published' as const,
    },
    {
      groupId: groupIds['kestlebridge-menders'],
      venueId: kVenue.id,
      title: 'Kestlebridge repair session',
      start: saturday(now, 33, 10, zone),
      hours: 3,
      slotMinutes: 30,
      capacity: 4,
      skillLimits: { textiles: 2 },
      status: 'published' as const,
    },
    {
      groupId: groupIds['kestlebridge-menders'],
      venueId: kVenue.id,
      title: 'Winter warmers: heaters, blankets and lamps',
      start: saturday(now, 61, 13, zone),
      hours: 3,
      slotMinutes: 20,
      capacity: 3,
      skillLimits: {},
      status: 'draft' as const,
    },
    {
      groupId: groupIds['orrin-vale-fixing-circle'],
      venueId: oVenue.id,
      title: 'Orrin Vale mending afternoon',
      start: saturday(now, 12, 14, zone),
      hours: 2.5,
      slotMinutes: 30,
      capacity: 3,
      skillLimits: {},
      status: 'published' as const,
    },
  ];
  const cats = new Map((await tx.select().from(categories)).map((c) => [c.slug, c]));
  let first = true;
  for (const p of plan) {
    const endsAt = new Date(p.start.getTime() + p.hours * 3600_000);
    const [{ id: eventId }] = await tx
      .insert(events)
      .values({
        groupId: p.groupId,
        venueId: p.venueId,
        title: p.title,
        description:
          'Tea, biscuits and tools provided. Arrive at the start of your slot; the reception desk is by the entrance.',
        startsAt: p.start,
        endsAt,
        slotMinutes: p.slotMinutes,
        slotCapacity: p.capacity,
        skillLimits: p.skillLimits,
        status: p.status,
        publishedAt: p.status === 'published' ? now : null,
      })
      .$returningId();
    const plans = generateSlots(p.start, endsAt, p.slotMinutes, p.capacity);
    await tx.insert(slots).values(plans.map((s) => ({ eventId, ...s })));
    if (!first) continue;
    first = false;
    const slotRows = await tx.select().from(slots).where(eq(slots.eventId, eventId)).orderBy(slots.startsAt);
    for (const [n, v] of DEMO_VISITORS.entries()) {
      const reference = DEMO_REFERENCES[n];
      const token = createHmac('sha256', linkSecret).update(`manage-booking:${reference}`).digest('base64url');
      const slot = slotRows[v.slot];
      const [{ id: bookingId }] = await tx
        .insert(bookings)
        .values({
          reference,
          eventId,
          slotId: slot.id,
          visitorName: v.name,
          visitorEmail: `${v.name.split(' ')[0].toLowerCase()}@example.org`,
          manageTokenHash: createHash('sha256').update(token).digest('hex'),
          consentAt: now,
        })
        .$returningId();
      await tx.insert(bookingItems).values(
        v.items.map((i, position) => ({
          bookingId,
          categoryId: cats.get(i.slug)!.id,
          brand: i.brand ?? null,
          model: i.model ?? null,
          ageYears: i.ageYears ?? null,
          fault: i.fault,
          mains: Boolean(cats.get(i.slug)!.mains),
          position,
        })),
      );
      await tx
        .update(slots)
        .set({ booked: slot.booked + v.items.length })
        .where(eq(slots.id, slot.id));
      slot.booked += v.items.length;
      for (const i of v.items) {
        const skill = cats.get(i.slug)!.skill;
        await tx
          .insert(slotSkillCounts)
          .values({ slotId: slot.id, skill, booked: 1 })
          .onDuplicateKeyUpdate({ set: { booked: sql`${slotSkillCounts.booked} + 1` } });
      }
    }
  }
}

const DEMO_REFERENCES = [
  'K7M-2QD',
  'R4T-8WX',
  'B9N-3HF',
  'L2P-6ZC',
  'N8V-4KS',
  'F3G-7YR',
  'P5Q-9DJ',
  'W6X-2MT',
  'M4C-8LA',
];
