import { createHmac, timingSafeEqual } from 'node:crypto';
import type { FirstAdminInput } from '../../../shared/schemas/auth';
import type { AppContext } from '../context';
import { isDuplicate } from '../db/retry';
import { HttpError } from '../http/errors';
import { refuseCommonPassword } from './common-passwords';
import { hashPassword } from './passwords';
import * as q from './queries';

/**
 * The one-time code that opens first-admin setup: derived from SESSION_SECRET, so every app process prints and
 * accepts the same code without storing it; it stops mattering once the first account exists.
 */
export const setupCode = (sessionSecret: string): string =>
  createHmac('sha256', sessionSecret).update('mendery first-admin setup').digest('base64url').slice(0, 24);

const alreadySetUp = () =>
  new HttpError(409, 'already-set-up', 'This installation already has an admin. Sign in instead.');

function sameCode(given: string, expected: string): boolean {
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  return a.length === b.length && timingSafeEqual(a, b);
}

/** Prints the setup code on the server's console while the installation has no account yet. */
export async function announceSetup(ctx: AppContext): Promise<void> {
  if ((await q.countUsers(ctx.database.db)) > 0) return;
  ctx.log(
    `▸ This installation is empty. Open the site and create the first admin with this one-time setup code:\n` +
      `  Setup code: ${setupCode(ctx.env.SESSION_SECRET)}`,
  );
}

/**
 * Creates the first admin of an empty installation. Everything cheap is checked before the password is hashed:
 * that setup is still open and that the caller has the code from the console. The settings row makes a racing
 * second attempt fail.
 */
export async function createFirstAdmin(ctx: AppContext, input: FirstAdminInput): Promise<number> {
  if ((await q.countUsers(ctx.database.db)) > 0) throw alreadySetUp();
  if (!sameCode(input.setupCode, setupCode(ctx.env.SESSION_SECRET))) {
    const message = 'That setup code is not right. Copy it from the server’s console.';
    throw new HttpError(403, 'setup-code', message, { setupCode: message });
  }
  refuseCommonPassword(input.password);
  const passwordHash = await hashPassword(input.password);
  try {
    return await ctx.database.db.transaction(async (tx) => {
      if ((await q.countUsers(tx)) > 0) throw alreadySetUp();
      await q.insertSetting(tx, 'first-admin', true);
      return q.insertUser(tx, {
        name: input.name,
        email: input.email,
        passwordHash,
        admin: true,
        emailVerifiedAt: new Date(),
      });
    });
  } catch (err) {
    if (isDuplicate(err)) throw alreadySetUp();
    throw err;
  }
}
