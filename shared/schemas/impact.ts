import { z } from 'zod';
import { BARRIERS, OUTCOMES } from '../event-day/constants';
import { MANUAL_FOLLOW_UP_STATUSES } from '../impact/follow-ups';

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2026-03-14.')
  .optional()
  .or(z.literal('').transform(() => undefined));
const optionalId = z.preprocess((v) => (v === '' ? undefined : v), z.coerce.number().int().positive().optional());

export const statsQuery = z.object({ groupId: optionalId, eventId: optionalId, from: isoDate, to: isoDate });

export const recordsQuery = statsQuery.extend({
  categoryId: optionalId,
  outcome: z.enum([...OUTCOMES, 'none']).optional(),
  barrier: z.enum(BARRIERS).optional(),
  month: z
    .string()
    .regex(/^\d{4}-\d{2}$/, 'Use a month like 2026-03.')
    .optional(),
  page: z.coerce.number().int().min(1).max(100000).optional(),
});

export const followUpUpdate = z.object({
  status: z.enum(MANUAL_FOLLOW_UP_STATUSES, { error: 'Choose waiting, part ordered or gave up.' }),
  note: z.string().trim().max(300).optional(),
});

export const rebookSchema = z.object({
  slotId: z.coerce.number({ error: 'Choose a time.' }).int().positive('Choose a time.'),
});

export const impactSettingsSchema = z.object({
  displacement: z.coerce
    .number({ error: 'Enter a number between 0 and 1.' })
    .min(0, 'Enter a number between 0 and 1.')
    .max(1, 'Enter a number between 0 and 1.'),
});
