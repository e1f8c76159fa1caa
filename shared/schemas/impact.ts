import { z } from 'zod';
import { BARRIERS, OUTCOMES } from '../event-day/constants';
import { MANUAL_FOLLOW_UP_STATUSES } from '../impact/follow-ups';

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'validation.date.format')
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
    .regex(/^\d{4}-\d{2}$/, 'validation.month.format')
    .optional(),
  page: z.coerce.number().int().min(1).max(100000).optional(),
});

export const followUpUpdate = z.object({
  status: z.enum(MANUAL_FOLLOW_UP_STATUSES, { error: 'validation.followUp.status' }),
  note: z.string().trim().max(300).optional(),
});

export const rebookSchema = z.object({
  slotId: z.coerce.number({ error: 'validation.slot.required' }).int().positive('validation.slot.required'),
});

export const impactSettingsSchema = z.object({
  displacement: z.coerce
    .number({ error: 'validation.number.zeroToOne' })
    .min(0, 'validation.number.zeroToOne')
    .max(1, 'validation.number.zeroToOne'),
});
