import { createHmac, timingSafeEqual } from 'node:crypto';
import type { AppContext } from '../context';
import { notFound } from '../http/errors';

/**
 * Links in mail that must outlive the first mail carry a secret derived from the server's secret, so any later mail
 * (a reminder) can carry the same link; only a hash is stored where one is stored at all.
 */
const mac = (ctx: AppContext, purpose: string) =>
  createHmac('sha256', ctx.env.SESSION_SECRET).update(purpose).digest('base64url');

/** The secret in a booking's manage link. */
export const manageTokenFor = (ctx: AppContext, reference: string) => mac(ctx, `manage-booking:${reference}`);

export const manageUrl = (ctx: AppContext, reference: string, token: string) =>
  `${ctx.env.publicUrl}/bookings/${reference}?token=${token}`;

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
