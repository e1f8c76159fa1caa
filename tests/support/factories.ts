import { eq } from 'drizzle-orm';
import { generateSlots } from '../../shared/booking/slots';
import { categories, events, slots, venues } from '../../server/src/db/schema/index';
import { randomBytes } from 'node:crypto';
import type { GroupRole } from '../../shared/constants';
import { hashPassword } from '../../server/src/auth/passwords';
import type { Db } from '../../server/src/db/client';
import { memberships, repairGroups, users } from '../../server/src/db/schema/index';

export const PASSWORD = 'correct horse battery';
let hashed: Promise<string> | null = null;
const unique = () => randomBytes(4).toString('hex');

export async function makeGroup(db: Db, name = `Group ${unique()}`) {
  const [{ id }] = await db
    .insert(repairGroups)
    .values({ name, slug: name.toLowerCase().replace(/\W+/g, '-'), town: 'Testbury', description: '' })
    .$returningId();
  return id;
}

export async function makeUser(
  db: Db,
  opts: { admin?: boolean; roles?: [groupId: number, role: GroupRole][]; verified?: boolean; email?: string } = {},
) {
  const email = opts.email ?? `u-${unique()}@example.org`;
  const passwordHash = await (hashed ??= hashPassword(PASSWORD));
  const [{ id }] = await db
    .insert(users)
    .values({
      email,
      name: `Person ${unique()}`,
      passwordHash,
      admin: opts.admin ?? false,
      emailVerifiedAt: opts.verified === false ? null : new Date(),
    })
    .$returningId();
  for (const [groupId, role] of opts.roles ?? [])
    await db.insert(memberships).values({ userId: id, groupId, role, status: 'active' });
  return { id, email, password: PASSWORD };
}

export async function makeVenue(db: Db, groupId: number) {
  const [{ id }] = await db
    .insert(venues)
    .values({ groupId, name: `Hall ${unique()}`, address: '1 Test Row', town: 'Testbury', accessNotes: '' })
    .$returningId();
  return id;
}

/** A published event tomorrow at 10:00 UTC with `slotCount` slots of 30 minutes. */
export async function makeEvent(
  db: Db,
  groupId: number,
  opts: {
    capacity?: number;
    slotCount?: number;
    status?: 'draft' | 'published';
    skillLimits?: Record<string, number>;
    startsAt?: Date;
  } = {},
) {
  const venueId = await makeVenue(db, groupId);
  const start =
    opts.startsAt ??
    new Date(Date.UTC(new Date().getUTCFullYear(), new Date().getUTCMonth(), new Date().getUTCDate() + 2, 10));
  const end = new Date(start.getTime() + (opts.slotCount ?? 4) * 30 * 60_000);
  const [{ id }] = await db
    .insert(events)
    .values({
      groupId,
      venueId,
      title: `Session ${unique()}`,
      description: '',
      startsAt: start,
      endsAt: end,
      slotMinutes: 30,
      slotCapacity: opts.capacity ?? 4,
      skillLimits: opts.skillLimits ?? {},
      status: opts.status ?? 'published',
    })
    .$returningId();
  await db.insert(slots).values(generateSlots(start, end, 30, opts.capacity ?? 4).map((s) => ({ eventId: id, ...s })));
  const slotIds = (
    await db.select({ id: slots.id }).from(slots).where(eq(slots.eventId, id)).orderBy(slots.startsAt)
  ).map((s) => s.id);
  return { eventId: id, venueId, slotIds };
}

export async function categoryId(db: Db, slug: string) {
  const [c] = await db.select().from(categories).where(eq(categories.slug, slug));
  return c.id;
}

export const visitor = (n = unique()) => ({ name: `Visitor ${n}`, email: `visitor-${n}@example.org` });
