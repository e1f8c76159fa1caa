import QRCode from 'qrcode';
import type { AppContext } from '../context';
import { HttpError } from '../http/errors';
import { enqueueMail } from '../mail/outbox';
import { composeMail } from '../mail/templates';
import { verifyPassword } from './passwords';
import * as q from './queries';
import { checkTotpCode, newTotpSecret, openTotpSecret, sealTotpSecret, totpUri } from './totp';
import { DEFAULT_LANGUAGE, type Language } from '../../../shared/i18n/languages';
import { translate } from '../i18n';

/** Two-factor sign-in with an authenticator app: set-up, the second step at sign-in, and turning it off. */

const wrongCode = (status = 400) => {
  const message = 'That code is not right, or was used already. Enter the 6 digits your app shows now.';
  return new HttpError(status, 'code-wrong', message, { code: message });
};

export async function twoFactorStatus(ctx: AppContext, userId: number) {
  const row = await q.twoFactorOf(ctx.database.db, userId);
  return { enabled: Boolean(row?.totpSecret), available: Boolean(row?.admin) };
}

/** A new secret, shown once as a QR code and as text; it is not on until a first code proves the app has it. */
export async function startSetup(ctx: AppContext, userId: number) {
  const row = (await q.twoFactorOf(ctx.database.db, userId))!;
  if (row.totpSecret)
    throw new HttpError(409, 'two-factor-on', 'Two-step sign-in is on already. Turn it off first to use a new app.');
  const secret = newTotpSecret();
  await q.setTotpPending(ctx.database.db, userId, sealTotpSecret(secret, ctx.env.SESSION_SECRET));
  const uri = totpUri(row.email, secret);
  const qr = await QRCode.toDataURL(uri, { errorCorrectionLevel: 'M', margin: 2, width: 240 });
  return { secret, uri, qr };
}

export async function confirmSetup(ctx: AppContext, userId: number, code: string, lang: Language = DEFAULT_LANGUAGE) {
  const row = (await q.twoFactorOf(ctx.database.db, userId))!;
  const secret = row.totpPending ? openTotpSecret(row.totpPending, ctx.env.SESSION_SECRET) : null;
  if (row.totpSecret) throw new HttpError(409, 'two-factor-on', 'Two-step sign-in is on already.');
  if (!secret) throw new HttpError(409, 'no-setup', 'Start the set-up again: there is no new code to confirm.');
  const step = await checkTotpCode(secret, code);
  if (step === null) throw wrongCode();
  await ctx.database.db.transaction(async (tx) => {
    await q.enableTotp(tx, userId, row.totpPending!, step);
    await enqueueMail(
      tx,
      composeMail(row.email, translate(lang, 'mail.account.twoStepOn.subject'), {
        paragraphs: [
          translate(lang, 'mail.hello', { name: row.name }),
          translate(lang, 'mail.account.twoStepOn.text'),
          translate(lang, 'mail.account.twoStepOn.ifNot'),
        ],
        language: lang,
      }),
    );
  });
  ctx.outbox.kick();
}

/** Whether this person needs a code after the password. */
export async function needsCode(ctx: AppContext, userId: number): Promise<boolean> {
  return Boolean((await q.twoFactorOf(ctx.database.db, userId))?.totpSecret);
}

/** Checks a code against the person's secret and spends its step; throws the same error for any wrong code. */
export async function takeCode(ctx: AppContext, userId: number, code: string, status = 400): Promise<void> {
  const row = await q.twoFactorOf(ctx.database.db, userId);
  const secret = row?.totpSecret ? openTotpSecret(row.totpSecret, ctx.env.SESSION_SECRET) : null;
  if (!secret) throw wrongCode(status);
  const step = await checkTotpCode(secret, code, { afterStep: row!.totpLastStep });
  if (step === null || !(await q.spendTotpStep(ctx.database.db, userId, step))) throw wrongCode(status);
}

/** Turning it off needs both the password and a code, so a session left open is not enough. */
export async function turnOff(
  ctx: AppContext,
  userId: number,
  input: { password: string; code: string },
  lang: Language = DEFAULT_LANGUAGE,
) {
  const row = (await q.twoFactorOf(ctx.database.db, userId))!;
  if (!row.totpSecret) throw new HttpError(409, 'two-factor-off', 'Two-step sign-in is off already.');
  if (!row.passwordHash || !(await verifyPassword(row.passwordHash, input.password))) {
    const message = 'That is not your current password.';
    throw new HttpError(403, 'wrong-password', message, { password: message });
  }
  await takeCode(ctx, userId, input.code, 403);
  await ctx.database.db.transaction(async (tx) => {
    await q.disableTotp(tx, userId);
    await enqueueMail(
      tx,
      composeMail(row.email, translate(lang, 'mail.account.twoStepOff.subject'), {
        paragraphs: [
          translate(lang, 'mail.hello', { name: row.name }),
          translate(lang, 'mail.account.twoStepOff.text'),
          translate(lang, 'mail.account.twoStepOff.ifNot'),
        ],
        language: lang,
      }),
    );
  });
  ctx.outbox.kick();
}
