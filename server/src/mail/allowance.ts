import type { AppContext } from '../context';
import { HttpError } from '../http/errors';
import { MariadbRateLimitStore } from '../http/rate-limit-store';

/** The stored key's prefix and window of the hourly mail count (also counted by http/visitor-limits.ts). */
export const MAIL_KEY_PREFIX = 'visitor-mail:';
export const MAIL_WINDOW_MS = 3600_000;

/**
 * How many mails an anonymous form may have sent to one address in an hour (confirmations, waiting-list notes, fresh
 * links): a stranger's address typed into our forms gets a few mails, never a flood. Counted in MariaDB.
 */
export function mailAllowance(ctx: AppContext) {
  const store = new MariadbRateLimitStore(ctx.database.db, MAIL_KEY_PREFIX);
  store.windowMs = MAIL_WINDOW_MS;
  const max = ctx.env.VISITOR_MAIL_MAX_PER_HOUR;
  return {
    /** Counts one mail to `email`; false when the address has had its allowance this hour. */
    async take(email: string): Promise<boolean> {
      const { totalHits } = await store.increment(email.trim().toLowerCase());
      return totalHits <= max;
    },
    /** Gives one back when the change that would have sent the mail did not happen. */
    async giveBack(email: string) {
      await store.decrement(email.trim().toLowerCase());
    },
    /** The refusal when the allowance is spent. */
    refusal: () =>
      new HttpError(
        429,
        'mail-limit',
        `We have already sent ${max} mails to this address in the last hour. Try again in an hour.`,
      ),
    /** As `take`, refusing with 429 when the allowance is spent. */
    async takeOrRefuse(email: string) {
      if (await this.take(email)) return;
      await this.giveBack(email);
      throw this.refusal();
    },
  };
}
