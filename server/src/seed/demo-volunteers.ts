import { eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { events, shifts, users, venueBenches, venues, volunteerProfiles, volunteerSkills } from '../db/schema/index';

/** Skills (1 learning, 2 capable, 3 expert), the kit people bring, benches, and who comes to the first session. */
const DEMO_SKILLS: Record<string, Record<string, 1 | 2 | 3>> = {
  'fixer@example.org': { electrical: 3, electronics: 2, mechanical: 2 },
  'wren.ashcombe@example.org': { textiles: 3, jewellery: 2 },
  'idris.pellow@example.org': { computers: 3, phones: 2, electronics: 2 },
  'hester.mayle@example.org': { bikes: 2, woodwork: 3, mechanical: 2, electrical: 1 },
  'organiser@example.org': { electronics: 1, textiles: 2 },
  'cosmo.brightwater@example.org': { woodwork: 2, toys: 2 },
};

export async function seedVolunteers(tx: Db) {
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
