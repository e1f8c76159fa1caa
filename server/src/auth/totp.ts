import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from 'node:crypto';
import { generate, generateSecret, generateURI, verify } from 'otplib';

/**
 * Time-based one-time codes (RFC 6238) through otplib: SHA-1, 30-second steps, 6 digits, as every authenticator app
 * reads them. A code is taken one step either side of now (clock drift), and only once: a step at or before the last
 * one accepted is refused.
 */
export const TOTP_ISSUER = 'Mendery';

export const newTotpSecret = (): string => generateSecret();

export const totpUri = (email: string, secret: string): string =>
  generateURI({ issuer: TOTP_ISSUER, label: email, secret });

type Secret = string | Uint8Array;

/** The code for a moment (seconds since the epoch); the tests hold it to RFC 6238's own figures. */
export const totpCodeAt = (secret: Secret, epoch: number, digits: 6 | 8 = 6): Promise<string> =>
  generate({ secret, epoch, digits });

/** The time step a code belongs to when it is right and newer than `afterStep`; null otherwise. */
export async function checkTotpCode(
  secret: Secret,
  code: string,
  opts: { afterStep?: number | null; epoch?: number; digits?: 6 | 8 } = {},
): Promise<number | null> {
  const digits = opts.digits ?? 6;
  if (!new RegExp(`^\\d{${digits}}$`).test(code)) return null;
  try {
    const result = await verify({
      secret,
      token: code,
      digits,
      epoch: opts.epoch ?? Math.floor(Date.now() / 1000),
      epochTolerance: 30,
      ...(opts.afterStep != null ? { afterTimeStep: opts.afterStep } : {}),
    });
    if (!result.valid) return null;
    // The TOTP strategy's result carries the step; the union type is shared with HOTP's, which does not.
    return (result as unknown as { timeStep: number }).timeStep;
  } catch {
    return null;
  }
}

/**
 * The secret at rest: AES-256-GCM under a key derived (HKDF-SHA256) from SESSION_SECRET, so a database dump alone
 * does not give it away. Stored as `v1.<iv>.<tag>.<ciphertext>`, base64url. Rotating SESSION_SECRET turns
 * two-factor sign-in off in effect: the admin resets it.
 */
const keyFor = (sessionSecret: string) =>
  Buffer.from(hkdfSync('sha256', sessionSecret, 'mendery', 'totp secret at rest v1', 32));

export function sealTotpSecret(secret: string, sessionSecret: string): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv('aes-256-gcm', keyFor(sessionSecret), iv);
  const body = Buffer.concat([cipher.update(secret, 'utf8'), cipher.final()]);
  return ['v1', iv, cipher.getAuthTag(), body]
    .map((p) => (typeof p === 'string' ? p : p.toString('base64url')))
    .join('.');
}

/** The secret, or null when the stored value was not sealed with this SESSION_SECRET (or was tampered with). */
export function openTotpSecret(sealed: string, sessionSecret: string): string | null {
  const [v, iv, tag, body] = sealed.split('.');
  if (v !== 'v1' || !iv || !tag || !body) return null;
  try {
    const decipher = createDecipheriv('aes-256-gcm', keyFor(sessionSecret), Buffer.from(iv, 'base64url'));
    decipher.setAuthTag(Buffer.from(tag, 'base64url'));
    return Buffer.concat([decipher.update(Buffer.from(body, 'base64url')), decipher.final()]).toString('utf8');
  } catch {
    return null;
  }
}
