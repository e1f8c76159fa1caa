import { z } from 'zod';

/** Closing an account is asked for in so many words, so a stray request cannot do it. */
export const closeAccountSchema = z.object({
  confirm: z.literal(true, { message: 'validation.account.closeConfirm' }),
});
