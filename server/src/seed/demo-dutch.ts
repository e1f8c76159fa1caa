import { createHash, createHmac } from 'node:crypto';
import { TZDate } from '@date-fns/tz';
import { eq, sql } from 'drizzle-orm';
import { generateSlots } from '../../../shared/booking/slots';
import type { Db } from '../db/client';
import { applyDefaultExclusions } from '../core/screening';
import {
  bookingItems,
  bookings,
  categories,
  events,
  memberships,
  repairGroups,
  slots,
  slotSkillCounts,
  venues,
} from '../db/schema/index';

/**
 * A Dutch-speaking group, so the languages can be seen working: the invented village of Kernebroek, its mending
 * circle, one organiser and a session in three weeks with three visitors who booked in Dutch. Every name is made up.
 */
export const DUTCH_GROUP = {
  slug: 'herstelkring-kernebroek',
  name: 'Herstelkring Kernebroek',
  town: 'Kernebroek',
  country: 'NLD',
  timeZone: 'Europe/Amsterdam',
  currency: 'EUR',
  defaultLanguage: 'nl',
  description:
    'Elke maand repareren we samen in buurthuis De Spoel: lampen, waterkokers, fietsen en kleding. Neem het kapotte ding mee, met de oplader en het verhaal van wat er misging.',
  houseRules:
    'Je blijft zelf bij je spullen en kijkt mee. We doen ons best, maar een reparatie is nooit gegarandeerd. Apparaten op netspanning testen we voordat ze mee naar huis gaan.',
};

export const DUTCH_ORGANISER = { email: 'organisator@example.org', name: 'Femke Dortmael' };

const VISITORS: { ref: string; name: string; slot: number; slug: string; brand?: string; fault: string }[] = [
  {
    ref: 'D3K-7NV',
    name: 'Joost Verhaegen',
    slot: 0,
    slug: 'kettle',
    brand: 'Kookgoed',
    fault: 'Slaat meteen weer af.',
  },
  { ref: 'D5R-2WQ', name: 'Ilse Brammert', slot: 0, slug: 'bicycle', fault: 'Achterrem piept en pakt slecht.' },
  { ref: 'D8T-4HM', name: 'Sanne Wolders', slot: 1, slug: 'clothing', fault: 'Rits van een winterjas is los.' },
];

/** Seeds the Dutch group inside the demo's transaction; `organiserId` is the account that runs it. */
export async function seedDutchGroup(tx: Db, organiserId: number, now: Date, linkSecret: string) {
  const [{ id: groupId }] = await tx.insert(repairGroups).values(DUTCH_GROUP).$returningId();
  await applyDefaultExclusions(tx, groupId);
  await tx.insert(memberships).values({ userId: organiserId, groupId, role: 'organiser', status: 'active' });
  const [{ id: venueId }] = await tx
    .insert(venues)
    .values({
      groupId,
      name: 'Buurthuis De Spoel',
      address: 'Molenstraat 8',
      town: 'Kernebroek',
      accessNotes: 'Gelijkvloers; stopcontacten langs de muur bij het raam.',
    })
    .$returningId();
  // The Saturday at least 19 days ahead, 10:00 in Kernebroek.
  const base = new TZDate(now.getTime(), DUTCH_GROUP.timeZone);
  const start = new TZDate(base.getFullYear(), base.getMonth(), base.getDate() + 19, 10, 0, 0, DUTCH_GROUP.timeZone);
  while (start.getDay() !== 6) start.setDate(start.getDate() + 1);
  const startsAt = new Date(start.getTime());
  const endsAt = new Date(startsAt.getTime() + 3 * 3600_000);
  const [{ id: eventId }] = await tx
    .insert(events)
    .values({
      groupId,
      venueId,
      title: 'Repareren in De Spoel',
      description:
        'Koffie, thee en gereedschap staan klaar. Kom aan het begin van je tijdvak; de ontvangst is bij de ingang.',
      startsAt,
      endsAt,
      slotMinutes: 30,
      slotCapacity: 4,
      skillLimits: {},
      status: 'published',
      publishedAt: now,
    })
    .$returningId();
  await tx.insert(slots).values(generateSlots(startsAt, endsAt, 30, 4).map((s) => ({ eventId, ...s })));
  const slotRows = await tx.select().from(slots).where(eq(slots.eventId, eventId)).orderBy(slots.startsAt);
  const cats = new Map((await tx.select().from(categories)).map((c) => [c.slug, c]));
  for (const v of VISITORS) {
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
        language: 'nl',
        consentAt: now,
      })
      .$returningId();
    await tx.insert(bookingItems).values({
      bookingId,
      categoryId: cat.id,
      brand: v.brand ?? null,
      fault: v.fault,
      mains: Boolean(cat.mains),
      position: 0,
    });
    await tx
      .update(slots)
      .set({ booked: sql`${slots.booked} + 1` })
      .where(eq(slots.id, slot.id));
    await tx
      .insert(slotSkillCounts)
      .values({ slotId: slot.id, skill: cat.skill, booked: 1 })
      .onDuplicateKeyUpdate({ set: { booked: sql`${slotSkillCounts.booked} + 1` } });
  }
}
