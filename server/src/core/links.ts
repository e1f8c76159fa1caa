import { createHmac, timingSafeEqual } from 'node:crypto';
import type { Request } from 'express';
import { z } from 'zod';
import { manageLinkExpired } from '../../../shared/booking/manage-link';
import type { AppContext } from '../context';
import { sha256 } from '../auth/tokens';
import { HttpError, notFound } from '../http/errors';
import { eventWithGroup } from './events';

/**
 * Links in mail that must outlive the first mail carry a secret derived from the server's secret, so any later mail
 * (a reminder) can carry the same link; only a hash is stored where one is stored at all.
 */
const mac = (ctx: AppContext, purpose: string) =>
  createHmac('sha256', ctx.env.SESSION_SECRET).update(purpose).digest('base64url');

/**
 * The secret in a booking's manage link, at the booking's token version: each fresh link mailed raises the version, so
 * the links mailed before stop working. Version 1 keeps the form of the links mailed before versions existed.
 */
export const manageTokenFor = (ctx: AppContext, reference: string, version: number) =>
  mac(ctx, version === 1 ? `manage-booking:${reference}` : `manage-booking:${reference}:${version}`);

const tokenQuery = z.object({ token: z.string().max(200).optional() });
/**
 * The booking's manage token: the client sends it in the X-Manage-Token header, which stays out of URLs and request
 * logs; ?token= is still read for links mailed before and for downloads the browser fetches as plain links.
 */
export const manageTokenOf = (req: Request): string | undefined => {
  const header = req.get('x-manage-token');
  if (header !== undefined && header.length > 0 && header.length <= 200) return header;
  return tokenQuery.parse(req.query).token;
};

/**
 * Checks a manage link's token against the booking's stored hash (a wrong or missing one is "not found", so references
 * leak nothing), then its lifetime: MANAGE_LINK_DAYS after the session's end the link answers 410.
 */
export async function checkManageToken(
  ctx: AppContext,
  b: { manageTokenHash: string; eventId: number },
  token: string | undefined,
): Promise<void> {
  if (!token) throw notFound('That booking');
  const a = Buffer.from(b.manageTokenHash, 'hex');
  const c = Buffer.from(sha256(token), 'hex');
  if (a.length !== c.length || !timingSafeEqual(a, c)) throw notFound('That booking');
  const e = await eventWithGroup(ctx.database.db, b.eventId);
  const days = ctx.env.MANAGE_LINK_DAYS;
  if (!e || manageLinkExpired(e.event.endsAt, days, new Date()))
    throw new HttpError(
      410,
      'link-expired',
      `This booking link has run out: a booking's link works until ${days} days after its session. For a booking still to come, ask for a fresh link by e-mail.`,
    );
}

/**
 * A mailed manage link. The token is in the fragment, which browsers never send: it stays out of server and proxy
 * logs and Referer headers; the page reads it there and sends it in the X-Manage-Token header.
 */
export const manageUrl = (ctx: AppContext, reference: string, token: string) =>
  `${ctx.env.publicUrl}/bookings/${reference}#token=${token}`;

/** The priority re-booking link of an item waiting for a part: the item's id and an HMAC of it. */
export const rebookToken = (ctx: AppContext, itemId: number) => `${itemId}.${mac(ctx, `rebook:${itemId}`)}`;
export const rebookUrl = (ctx: AppContext, itemId: number) => `${ctx.env.publicUrl}/rebook/${rebookToken(ctx, itemId)}`;

/** The item a re-booking token names; anything else is "not found". */
export function itemOfRebookToken(ctx: AppContext, token: string): number {
  const [id, given] = token.split('.');
  const itemId = Number(id);
  if (!Number.isInteger(itemId) || itemId <= 0 || !given) throw notFound('That link');
  const expected = Buffer.from(rebookToken(ctx, itemId).split('.')[1]);
  const actual = Buffer.from(given);
  if (expected.length !== actual.length || !timingSafeEqual(expected, actual)) throw notFound('That link');
  return itemId;
}
