import { eq } from 'drizzle-orm';
import { DEMO_PASSWORD } from '../../../shared/constants';
import { hashPassword } from '../auth/passwords';
import type { Db } from '../db/client';
import { TZDate } from '@date-fns/tz';
import { createHash, createHmac } from 'node:crypto';
import { generateSlots } from '../../../shared/booking/slots';
import { sql } from 'drizzle-orm';
import {
  bookingItems,
  bookings,
  categories,
  events,
  memberships,
  repairGroups,
  settings,
  shifts,
  slots,
  slotSkillCounts,
  users,
  venueBenches,
  venues,
  volunteerProfiles,
  volunteerSkills,
} from '../db/schema/index';
import { applyDefaultExclusions } from '../core/screening';
import { ensureCategories } from './categories';
import { seedToday } from './demo-today';
import { seedHistory } from './demo-history';

/**
 * The demo scenario: the invented town of Kestlebridge and its neighbour Orrin Vale, two repair groups,
 * a church-hall venue and a handful of volunteers. Every name here is made up.
 */
export const DEMO_GROUPS = [
  {
    slug: 'kestlebridge-menders',
    name: 'Kestlebridge Menders',
    town: 'Kestlebridge',
    description:
      'Monthly repair sessions in Tanner’s Yard Hall: lamps, kettles, laptops, clothes and bikes. Bring the thing, its charger, and the story of what went wrong.',
  },
  {
    slug: 'orrin-vale-fixing-circle',
    name: 'Orrin Vale Fixing Circle',
    town: 'Orrin Vale',
    description:
      'A small group meeting in the old school library on the second Saturday of the month. Strong on textiles and woodwork.',
  },
] as const;

type Role = 'organiser' | 'host' | 'fixer';
export const DEMO_PEOPLE: { email: string; name: string; admin?: boolean; roles: [slug: string, role: Role][] }[] = [
  { email: 'admin@example.org', name: 'Ada Quennell', admin: true, roles: [] },
  {
    email: 'organiser@example.org',
    name: 'Maren Oakridge',
    roles: [
      ['kestlebridge-menders', 'organiser'],
      ['orrin-vale-fixing-circle', 'fixer'],
    ],
  },
  { email: 'fixer@example.org', name: 'Tobin Halloway', roles: [['kestlebridge-menders', 'fixer']] },
  { email: 'host@example.org', name: 'Priya Vantongeren', roles: [['kestlebridge-menders', 'host']] },
  { email: 'wren.ashcombe@example.org', name: 'Wren Ashcombe', roles: [['kestlebridge-menders', 'fixer']] },
  { email: 'idris.pellow@example.org', name: 'Idris Pellow', roles: [['kestlebridge-menders', 'fixer']] },
  {
    email: 'hester.mayle@example.org',
    name: 'Hester Mayle',
    roles: [
      ['kestlebridge-menders', 'fixer'],
      ['orrin-vale-fixing-circle', 'organiser'],
    ],
  },
  { email: 'cosmo.brightwater@example.org', name: 'Cosmo Brightwater', roles: [['orrin-vale-fixing-circle', 'fixer']] },
];

export async function isSeeded(db: Db): Promise<boolean> {
  const [row] = await db.select().from(settings).where(eq(settings.key, 'seeded'));
  return Boolean(row);
}

/** Seeds once; later runs find the `seeded` setting and leave the data alone. */
export async function seedDemo(db: Db, opts: { linkSecret?: string; now?: Date } = {}): Promise<void> {
  await ensureCategories(db);
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await db.transaction(async (tx) => {
    await tx.insert(settings).values({ key: 'seeded', value: true });
    await tx.insert(settings).values({ key: 'demo', value: true });
    const groupIds: Record<string, number> = {};
    for (const g of DEMO_GROUPS) {
      const [{ id }] = await tx.insert(repairGroups).values(g).$returningId();
      groupIds[g.slug] = id;
    }
    for (const id of Object.values(groupIds)) await applyDefaultExclusions(tx, id);
    await tx
      .update(repairGroups)
      .set({ houseRules: HOUSE_RULES })
      .where(eq(repairGroups.id, groupIds['kestlebridge-menders']));
    await tx
      .update(repairGroups)
      .set({
        houseRules:
          'Bring one item per visitor when we are busy. Children are welcome with an adult. No large furniture: we meet upstairs.',
      })
      .where(eq(repairGroups.id, groupIds['orrin-vale-fixing-circle']));
    await tx.insert(venues).values([
      {
        groupId: groupIds['kestlebridge-menders'],
        name: 'Tanner’s Yard Hall',
        address: '14 Weaver Street',
        town: 'Kestlebridge',
        accessNotes:
          'Step-free entrance from the car park; lift to the upper room. Tables and 13 A sockets along the east wall.',
      },
      {
        groupId: groupIds['orrin-vale-fixing-circle'],
        name: 'Old School Library',
        address: '2 Chapel Lane',
        town: 'Orrin Vale',
        accessNotes: 'Two steps at the front door; a ramp is kept inside.',
      },
    ]);
    const now = new Date();
    for (const p of DEMO_PEOPLE) {
      const [{ id }] = await tx
        .insert(users)
        .values({ email: p.email, name: p.name, admin: p.admin ?? false, passwordHash, emailVerifiedAt: now })
        .$returningId();
      for (const [slug, role] of p.roles)
        await tx.insert(memberships).values({ userId: id, groupId: groupIds[slug], role, status: 'active' });
    }
    await seedEvents(tx as unknown as Db, groupIds, opts.now ?? new Date(), opts.linkSecret ?? 'demo');
    await seedVolunteers(tx as unknown as Db);
    await seedToday(tx as unknown as Db, opts.now ?? new Date(), opts.linkSecret ?? 'demo');
    await seedHistory(tx as unknown as Db, opts.now ?? new Date());
    // One volunteer waiting for an organiser to confirm them.
    const [{ id: pendingId }] = await tx
      .insert(users)
      .values({ email: 'juniper.oakes@example.org', name: 'Juniper Oakes', passwordHash, emailVerifiedAt: now })
      .$returningId();
    await tx
      .insert(memberships)
      .values({ userId: pendingId, groupId: groupIds['kestlebridge-menders'], role: 'fixer', status: 'pending' });
  });
}

/** Marks an empty installation as seeded without demo data, so DEMO=1 later does not mix demo rows into real ones. */
export async function markEmptyInstall(db: Db): Promise<void> {
  await db.insert(settings).values({ key: 'seeded', value: false });
}

const HOUSE_RULES = [
  'Book one slot per visitor; up to three items if they are small.',
  'Stay with your item while it is looked at: you will learn how it was fixed.',
  'Our fixers are volunteers and help on a best-effort basis. We cannot guarantee a repair.',
  'Mains items are safety-checked before they go home.',
  'We do not take microwave ovens, gas appliances, anything with a refrigerant circuit, swollen batteries or items with damaged mains cables.',
].join('\n');

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

async function seedEvents(tx: Db, groupIds: Record<string, number>, now: Date, linkSecret: string) {
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

/** Skills (1 learning, 2 capable, 3 expert), the kit people bring, benches, and who comes to the first session. */
const DEMO_SKILLS: Record<string, Record<string, 1 | 2 | 3>> = {
  'fixer@example.org': { electrical: 3, electronics: 2, mechanical: 2 },
  'wren.ashcombe@example.org': { textiles: 3, jewellery: 2 },
  'idris.pellow@example.org': { computers: 3, phones: 2, electronics: 2 },
  'hester.mayle@example.org': { bikes: 2, woodwork: 3, mechanical: 2, electrical: 1 },
  'organiser@example.org': { electronics: 1, textiles: 2 },
  'cosmo.brightwater@example.org': { woodwork: 2, toys: 2 },
};

async function seedVolunteers(tx: Db) {
  const people = await tx.select().from(users);
  const idOf = (email: string) => people.find((p) => p.email === email)!.id;
  for (const [email, skills] of Object.entries(DEMO_SKILLS)) {
    await tx
      .insert(volunteerSkills)
      .values(Object.entries(skills).map(([skill, level]) => ({ userId: idOf(email), skill, level })));
  }
  await tx.insert(volunteerProfiles).values([
    {
      userId: idOf('fixer@example.org'),
      kit: ['multimeter'],
      notes: 'Happy with anything that heats up. Brings his own insulated screwdrivers.',
    },
    {
      userId: idOf('wren.ashcombe@example.org'),
      kit: ['sewing-machine'],
      notes: 'Zips, hems, patches; can teach darning.',
    },
  ]);
  const [hall] = await tx.select().from(venues).where(eq(venues.name, 'Tanner’s Yard Hall'));
  await tx.insert(venueBenches).values([
    {
      venueId: hall.id,
      name: 'Mains bench',
      seats: 2,
      equipment: ['soldering-station', 'multimeter', 'appliance-safety-tester', 'isolation-transformer'],
      position: 0,
    },
    {
      venueId: hall.id,
      name: 'Electronics bench',
      seats: 2,
      equipment: ['soldering-station', 'hot-air-station', 'multimeter'],
      position: 1,
    },
    { venueId: hall.id, name: 'Sewing table', seats: 2, equipment: ['sewing-machine'], position: 2 },
    { venueId: hall.id, name: 'Bike corner', seats: 1, equipment: ['bike-stand', 'clamps'], position: 3 },
    { venueId: hall.id, name: 'Open table', seats: 2, equipment: ['multimeter', 'clamps'], position: 4 },
  ]);
  const [first] = await tx.select().from(events).where(eq(events.venueId, hall.id)).orderBy(events.startsAt).limit(1);
  const at = (h: number) => new Date(first.startsAt.getTime() + h * 3600_000);
  await tx.insert(shifts).values([
    { eventId: first.id, userId: idOf('fixer@example.org'), coming: true, startsAt: at(0), endsAt: first.endsAt },
    { eventId: first.id, userId: idOf('wren.ashcombe@example.org'), coming: true, startsAt: at(0), endsAt: at(2) },
    {
      eventId: first.id,
      userId: idOf('idris.pellow@example.org'),
      coming: true,
      startsAt: at(0),
      endsAt: first.endsAt,
    },
    {
      eventId: first.id,
      userId: idOf('hester.mayle@example.org'),
      coming: true,
      startsAt: at(1),
      endsAt: first.endsAt,
    },
  ]);
}
