import type { z } from 'zod';
import type { Profile, SkillsMatrix } from '../../../../shared/api/skills';
import { SKILLS } from '../../../../shared/constants';
import type { profileSchema } from '../../../../shared/schemas/skills';
import type { AppContext } from '../../context';
import { skillsOf } from '../../core/skills';
import { activeMemberRows, profileRow, profileRows, replaceSkills, upsertProfile } from './queries';

export async function getProfile(ctx: AppContext, userId: number): Promise<Profile> {
  const { db } = ctx.database;
  const p = await profileRow(db, userId);
  return { skills: (await skillsOf(db, [userId])).get(userId)!, kit: p?.kit ?? [], notes: p?.notes ?? '' };
}

export async function saveProfile(
  ctx: AppContext,
  userId: number,
  input: z.output<typeof profileSchema>,
): Promise<Profile> {
  await ctx.database.db.transaction(async (tx) => {
    const levels = Object.entries(input.skills)
      .filter(([, l]) => l)
      .map(([skill, level]) => ({ skill, level: level! }));
    await replaceSkills(tx, userId, levels);
    await upsertProfile(tx, userId, input.kit, input.notes ?? '');
  });
  return getProfile(ctx, userId);
}

/** The group's volunteers × skills, for the matrix. */
export async function skillsMatrix(ctx: AppContext, groupId: number): Promise<SkillsMatrix> {
  const { db } = ctx.database;
  const people = new Map<number, { userId: number; name: string; email: string; roles: string[] }>();
  for (const r of await activeMemberRows(db, groupId)) {
    const p = people.get(r.userId) ?? { userId: r.userId, name: r.name, email: r.email, roles: [] };
    p.roles.push(r.role);
    people.set(r.userId, p);
  }
  const ids = [...people.keys()];
  const skills = await skillsOf(db, ids);
  const profiles = await profileRows(db, ids);
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
