import { createHmac, hkdfSync, timingSafeEqual } from 'node:crypto';

/**
 * Short-lived signed addresses for what a page must load as a plain link (a photo in an `<img>`, the calendar file),
 * so the booking's manage token never goes into a URL. Pure: the key and the time are arguments.
 */

/** At least this long between signing and expiry: time to open a photo or the calendar file from the page. */
export const SIGNED_URL_TTL_S = 10 * 60;
/** Expiries are rounded up to this step, so the page's addresses stay the same for a while and the browser caches. */
const STEP_S = 5 * 60;

/** A key of its own for signed addresses, derived from the server's secret (RFC 5869 HKDF). */
export const signingKey = (serverSecret: string) =>
  Buffer.from(hkdfSync('sha256', serverSecret, 'mendery', 'signed urls v1', 32));

const mac = (key: Buffer, path: string, expires: number) =>
  createHmac('sha256', key).update(`${path}\n${expires}`).digest('base64url');

/** `path?expires=<unix seconds>&sig=<HMAC-SHA256 over the path and the expiry>`, good for 10 to 15 minutes. */
export function signPath(key: Buffer, path: string, nowMs: number, ttlS = SIGNED_URL_TTL_S) {
  const expires = Math.ceil((Math.floor(nowMs / 1000) + ttlS) / STEP_S) * STEP_S;
  return `${path}?expires=${expires}&sig=${mac(key, path, expires)}`;
}

/** True when `path` was signed with this key, with these query values, and the expiry is still ahead of `nowMs`. */
export function verifySignedPath(key: Buffer, path: string, query: Record<string, unknown>, nowMs: number) {
  const { expires, sig } = query;
  if (typeof expires !== 'string' || typeof sig !== 'string' || !/^\d{1,12}$/.test(expires)) return false;
  const exp = Number(expires);
  if (nowMs >= exp * 1000) return false;
  const want = Buffer.from(mac(key, path, exp));
  const got = Buffer.from(sig);
  return want.length === got.length && timingSafeEqual(want, got);
}
