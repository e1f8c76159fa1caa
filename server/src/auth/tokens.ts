import { createHash, randomBytes } from 'node:crypto';

/** 32 random bytes, base64url: what goes in the e-mailed link. Only its SHA-256 is stored. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: sha256(token) };
}

export const sha256 = (s: string): string => createHash('sha256').update(s).digest('hex');
