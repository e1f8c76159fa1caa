import { and, asc, eq, gte, inArray } from 'drizzle-orm';
import type { z } from 'zod';
import { SKILLS } from '../../../../shared/constants';
import { formatDay, formatTimeRange } from '../../../../shared/format';
import { coverage, gaps } from '../../../../shared/rota';
import type { myShiftSchema, profileSchema } from '../../../../shared/schemas/volunteers';
import type { AppContext } from '../../context';
import {
  bookingItems,
  bookings,
  categories,
  events,
  memberships,
  repairGroups,
  shifts,
  slots,
  users,
  volunteerProfiles,
  volunteerSkills,
} from '../../db/schema/index';
import { HttpError, notFound } from '../../http/errors';
import { skillsOf } from '../../core/skills';
import { enqueueMail } from '../../mail/outbox';
import { composeMail } from '../../mail/templates';

export async function getProfile(ctx: AppContext, userId: number) {
  const { db } = ctx.database;
  const [p] = await db.select().from(volunteerProfiles).where(eq(volunteerProfiles.userId, userId));
  return { skills: (await skillsOf(db, [userId])).get(userId)!, kit: p?.kit ?? [], notes: p?.notes ?? '' };
}

export async function saveProfile(ctx: AppContext, userId: number, input: z.output<typeof profileSchema>) {
  await ctx.database.db.transaction(async (tx) => {
    await tx.delete(volunteerSkills).where(eq(volunteerSkills.userId, userId));
    const rows = Object.entries(input.skills)
      .filter(([, l]) => l)
      .map(([skill, level]) => ({ userId, skill, level: level! }));
    if (rows.length) await tx.insert(volunteerSkills).values(rows);
    await tx
      .insert(volunteerProfiles)
      .values({ userId, kit: input.kit, notes: input.notes ?? '' })
      .onDuplicateKeyUpdate({ set: { kit: input.kit, notes: input.notes ?? '' } });
  });
  return getProfile(ctx, userId);
}

/** The group's volunteers × skills, for the matrix. */
export async function skillsMatrix(ctx: AppContext, groupId: number) {
  const { db } = ctx.database;
  const rows = await db
    .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.groupId, groupId), eq(memberships.status, 'active')))
    .orderBy(asc(users.name));
  const people = new Map<number, { userId: number; name: string; email: string; roles: string[] }>();
  for (const r of rows) {
    const p = people.get(r.userId) ?? { userId: r.userId, name: r.name, email: r.email, roles: [] };
    p.roles.push(r.role);
    people.set(r.userId, p);
  }
  const ids = [...people.keys()];
  const skills = await skillsOf(db, ids);
  const profiles = ids.length
    ? await db.select().from(volunteerProfiles).where(inArray(volunteerProfiles.userId, ids))
    : [];
  return {
    skills: SKILLS,
    volunteers: [...people.values()].map((p) => ({
      ...p,
      skills: skills.get(p.userId)!,
      kit: profiles.find((x) => x.userId === p.userId)?.kit ?? [],
      notes: profiles.find((x) => x.userId === p.userId)?.notes ?? '',
    })),
  };
}

export async function setMyShift(
  ctx: AppContext,
  eventId: number,
  userId: number,
  input: z.output<typeof myShiftSchema>,
) {
  const { db } = ctx.database;
  const [e] = await db.select().from(events).where(eq(events.id, eventId));
  if (!e) throw notFound('That event');
  if (e.status === 'cancelled') throw new HttpError(409, 'cancelled', 'This event has been cancelled.');
  const startsAt = input.startsAt ?? e.startsAt;
  const endsAt = input.endsAt ?? e.endsAt;
  if (startsAt < e.startsAt || endsAt > e.endsAt)
    throw new HttpError(400, 'invalid', 'Some fields need attention.', {
      startsAt: 'Choose hours within the event’s opening hours.',
    });
  await db
    .insert(shifts)
    .values({ eventId, userId, coming: input.coming, startsAt, endsAt })
    .onDuplicateKeyUpdate({ set: { coming: input.coming, startsAt, endsAt, updatedAt: new Date() } });
  return { eventId, coming: input.coming, startsAt, endsAt };
}

/** Upcoming events of the groups a person volunteers with, with their answer and shift. */
export async function myEvents(ctx: AppContext, userId: number) {
  const { db } = ctx.database;
  const groupIds = (
    await db
      .select({ g: memberships.groupId })
      .from(memberships)
      .where(and(eq(memberships.userId, userId), eq(memberships.status, 'active')))
  ).map((r) => r.g);
  if (!groupIds.length) return [];
  const rows = await db
    .select({
      id: events.id,
      title: events.title,
      startsAt: events.startsAt,
      endsAt: events.endsAt,
      status: events.status,
      groupName: repairGroups.name,
      timeZone: repairGroups.timeZone,
    })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(
      and(
        inArray(events.groupId, groupIds),
        inArray(events.status, ['published', 'closed']),
        gte(events.endsAt, new Date()),
      ),
    )
    .orderBy(asc(events.startsAt));
  const mine = rows.length
    ? await db
        .select()
        .from(shifts)
        .where(
          and(
            eq(shifts.userId, userId),
            inArray(
              shifts.eventId,
              rows.map((r) => r.id),
            ),
          ),
        )
    : [];
  return rows.map((r) => {
    const s = mine.find((x) => x.eventId === r.id);
    return { ...r, shift: s ? { coming: Boolean(s.coming), startsAt: s.startsAt, endsAt: s.endsAt } : null };
  });
}

/** The rota of one event: who comes when, the skills covered per slot, and the gaps against what is booked. */
export async function rota(ctx: AppContext, eventId: number) {
  const { db } = ctx.database;
  const slotRows = await db.select().from(slots).where(eq(slots.eventId, eventId)).orderBy(asc(slots.startsAt));
  const shiftRows = await db
    .select({ shift: shifts, name: users.name })
    .from(shifts)
    .innerJoin(users, eq(users.id, shifts.userId))
    .where(eq(shifts.eventId, eventId))
    .orderBy(asc(users.name));
  const skills = await skillsOf(
    db,
    shiftRows.map((s) => s.shift.userId),
  );
  const coming = shiftRows.filter((s) => s.shift.coming);
  const demandRows = await db
    .select({ slotId: bookings.slotId, skill: categories.skill })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .where(and(eq(bookings.eventId, eventId), eq(bookings.status, 'confirmed')));
  const demand = demandRows.map((d) => ({ slotIndex: slotRows.findIndex((s) => s.id === d.slotId), skill: d.skill }));
  const cover = coverage(
    coming.map((s) => ({
      userId: s.shift.userId,
      name: s.name,
      startsAt: s.shift.startsAt,
      endsAt: s.shift.endsAt,
      skills: skills.get(s.shift.userId)!,
    })),
    slotRows,
    SKILLS,
  );
  return {
    slots: slotRows.map((s, i) => ({
      id: s.id,
      startsAt: s.startsAt,
      endsAt: s.endsAt,
      demand: Object.fromEntries(
        SKILLS.map((k) => [k, demand.filter((d) => d.slotIndex === i && d.skill === k).length]),
      ),
    })),
    shifts: shiftRows.map((s) => ({
      userId: s.shift.userId,
      name: s.name,
      coming: Boolean(s.shift.coming),
      startsAt: s.shift.startsAt,
      endsAt: s.shift.endsAt,
      benchId: s.shift.benchId,
      skills: skills.get(s.shift.userId)!,
    })),
    coverage: cover,
    gaps: gaps(cover, demand, SKILLS),
  };
}

/** Mails the group's fixers who have a wanted skill and have not said they come. */
export async function askForSkills(ctx: AppContext, eventId: number, wanted: string[]) {
  const { db } = ctx.database;
  const [e] = await db
    .select({ event: events, group: repairGroups })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(eq(events.id, eventId));
  if (!e) throw notFound('That event');
  const fixers = await db
    .select({ userId: users.id, name: users.name, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.groupId, e.group.id), eq(memberships.role, 'fixer'), eq(memberships.status, 'active')));
  const skills = await skillsOf(
    db,
    fixers.map((f) => f.userId),
  );
  const answered = new Set(
    (
      await db
        .select()
        .from(shifts)
        .where(and(eq(shifts.eventId, eventId), eq(shifts.coming, true)))
    ).map((s) => s.userId),
  );
  const targets = fixers.filter(
    (f) => !answered.has(f.userId) && wanted.some((w) => (skills.get(f.userId)![w] ?? 0) > 0),
  );
  await db.transaction(async (tx) => {
    for (const f of targets) {
      const theirs = wanted.filter((w) => (skills.get(f.userId)![w] ?? 0) > 0);
      await enqueueMail(
        tx,
        composeMail(f.email, `Can you help at ${e.event.title}?`, {
          paragraphs: [
            `Hello ${f.name},`,
            `${e.group.name} has visitors booked for ${e.event.title} on ${formatDay(e.event.startsAt, e.group.timeZone)} (${formatTimeRange(e.event.startsAt, e.event.endsAt, e.group.timeZone)}) who need ${theirs.join(' and ')} — and nobody with that skill has said they are coming yet.`,
            'If you can come, even for part of the day, say so on your Mendery page.',
          ],
          action: { label: 'Say when I can come', url: `${ctx.env.publicUrl}/bench` },
        }),
      );
    }
  });
  ctx.outbox.kick();
  return { sent: targets.length };
}
