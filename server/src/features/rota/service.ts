import type { z } from 'zod';
import type { AskResult, MyEvent, Rota, SeatResult, ShiftAnswer } from '../../../../shared/api/rota';
import { SKILLS } from '../../../../shared/constants';
import { coverage, gaps } from '../../../../shared/rota';
import type { myShiftSchema } from '../../../../shared/schemas/rota';
import type { AppContext } from '../../context';
import { HttpError, notFound } from '../../http/errors';
import { skillsOf } from '../../core/skills';
import { enqueueMail } from '../../mail/outbox';
import { askForSkillMail } from './mails';
import * as q from './queries';
import { eventWithGroup, slotsOfEvent } from '../../core/events';

export async function setMyShift(
  ctx: AppContext,
  eventId: number,
  userId: number,
  input: z.output<typeof myShiftSchema>,
): Promise<ShiftAnswer> {
  const { db } = ctx.database;
  const e = await q.eventRow(db, eventId);
  if (!e) throw notFound('That event');
  if (e.status === 'cancelled') throw new HttpError(409, 'cancelled', 'This event has been cancelled.');
  const startsAt = input.startsAt ?? e.startsAt;
  const endsAt = input.endsAt ?? e.endsAt;
  if (startsAt < e.startsAt || endsAt > e.endsAt)
    throw new HttpError(400, 'invalid', 'errors.invalid', {
      startsAt: 'Choose hours within the event’s opening hours.',
    });
  await q.upsertShift(db, { eventId, userId, coming: input.coming, startsAt, endsAt });
  return { eventId, coming: input.coming, startsAt, endsAt };
}

/** Upcoming events of the groups a person volunteers with, with their answer and shift. */
export async function myEvents(ctx: AppContext, userId: number): Promise<MyEvent[]> {
  const { db } = ctx.database;
  const groupIds = await q.activeGroupIds(db, userId);
  if (!groupIds.length) return [];
  const rows = await q.upcomingEventRows(db, groupIds);
  const mine = await q.shiftsOfUser(
    db,
    userId,
    rows.map((r) => r.id),
  );
  return rows.map((r) => {
    const s = mine.find((x) => x.eventId === r.id);
    return { ...r, shift: s ? { coming: Boolean(s.coming), startsAt: s.startsAt, endsAt: s.endsAt } : null };
  });
}

/** The rota of one event: who comes when, the skills covered per slot, and the gaps against what is booked. */
export async function rota(ctx: AppContext, eventId: number): Promise<Rota> {
  const { db } = ctx.database;
  const slotRows = await slotsOfEvent(db, eventId);
  const shiftRows = await q.shiftRowsOfEvent(db, eventId);
  const skills = await skillsOf(
    db,
    shiftRows.map((s) => s.shift.userId),
  );
  const coming = shiftRows.filter((s) => s.shift.coming);
  const demand = (await q.demandRows(db, eventId)).map((d) => ({
    slotIndex: slotRows.findIndex((s) => s.id === d.slotId),
    skill: d.skill,
  }));
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
export async function askForSkills(ctx: AppContext, eventId: number, wanted: string[]): Promise<AskResult> {
  const { db } = ctx.database;
  const e = await eventWithGroup(db, eventId);
  if (!e) throw notFound('That event');
  const fixers = await q.activeFixers(db, e.group.id);
  const skills = await skillsOf(
    db,
    fixers.map((f) => f.userId),
  );
  const answered = await q.comingUserIds(db, eventId);
  const theirs = (userId: number) => wanted.filter((w) => (skills.get(userId)![w] ?? 0) > 0);
  const targets = fixers.filter((f) => !answered.has(f.userId) && theirs(f.userId).length > 0);
  await db.transaction(async (tx) => {
    for (const f of targets)
      await enqueueMail(tx, askForSkillMail(f, e.event, e.group, theirs(f.userId), ctx.env.publicUrl));
  });
  ctx.outbox.kick();
  return { sent: targets.length };
}

/** Seats a coming fixer at one of the event's benches, or lets them move freely (null). */
export async function seat(
  ctx: AppContext,
  eventId: number,
  userId: number,
  benchId: number | null,
): Promise<SeatResult> {
  const { db } = ctx.database;
  if (benchId !== null && !(await q.eventBenchRow(db, eventId, benchId)))
    throw new HttpError(400, 'invalid', 'errors.invalid', {
      benchId: 'That bench is not set out at this event.',
    });
  const s = await q.shiftRow(db, eventId, userId);
  if (!s) throw notFound('That shift');
  await q.setShiftBench(db, s.id, benchId);
  return { ok: true };
}
