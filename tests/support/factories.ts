import { randomBytes } from 'node:crypto';
import type { GroupRole } from '../../shared/constants';
import { hashPassword } from '../../server/src/auth/passwords';
import type { Db } from '../../server/src/db/client';
import { memberships, repairGroups, users } from '../../server/src/db/schema/index';

export const PASSWORD = 'correct horse battery';
let hashed: Promise<string> | null = null;
const unique = () => randomBytes(4).toString('hex');

export async function makeGroup(db: Db, name = `Group ${unique()}`) {
  const [{ id }] = await db.insert(repairGroups).values({ name, slug: name.toLowerCase().replace(/\W+/g, '-'), town: 'Testbury', description: '' }).$returningId();
  return id;
}

export async function makeUser(db: Db, opts: { admin?: boolean; roles?: [groupId: number, role: GroupRole][]; verified?: boolean; email?: string } = {}) {
  const email = opts.email ?? `u-${unique()}@example.org`;
  const passwordHash = await (hashed ??= hashPassword(PASSWORD));
  const [{ id }] = await db
    .insert(users)
    .values({ email, name: `Person ${unique()}`, passwordHash, admin: opts.admin ?? false, emailVerifiedAt: opts.verified === false ? null : new Date() })
    .$returningId();
  for (const [groupId, role] of opts.roles ?? []) await db.insert(memberships).values({ userId: id, groupId, role, status: 'active' });
  return { id, email, password: PASSWORD };
}
