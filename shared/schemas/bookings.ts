import { z } from 'zod';
import { HAZARDS } from '../constants';
import { email } from './auth';

export const visitorSchema = z.object({
  name: z
    .string({ error: 'validation.name.required' })
    .trim()
    .min(1, 'validation.name.required')
    .max(120, 'validation.name.tooLong'),
  email,
  phone: z
    .string()
    .trim()
    .max(40)
    .regex(/^[+0-9 ()-]*$/, 'validation.phone.characters')
    .optional()
    .transform((v) => v || undefined),
});

/** Asking for a fresh manage link for every current booking of an e-mail address. */
export const freshLinkSchema = z.object({ email });
export type FreshLinkInput = z.input<typeof freshLinkSchema>;

export const bookingItemSchema = z.object({
  categoryId: z.coerce.number({ error: 'validation.item.category' }).int().positive('validation.item.category'),
  brand: z
    .string()
    .trim()
    .max(80)
    .optional()
    .transform((v) => v || undefined),
  model: z
    .string()
    .trim()
    .max(80)
    .optional()
    .transform((v) => v || undefined),
  ageYears: z.preprocess(
    (v) => (v === '' || v === null ? undefined : v),
    z.coerce.number().int('validation.item.ageWholeYears').min(0, 'validation.item.ageNegative').max(150).optional(),
  ),
  fault: z
    .string({ error: 'validation.item.faultRequired' })
    .trim()
    .min(5, 'validation.item.faultShort')
    .max(2000, 'validation.item.faultLong'),
  mains: z.boolean().optional(),
  battery: z.boolean().optional(),
  hazards: z.array(z.enum(HAZARDS)).max(HAZARDS.length).default([]),
});
export type BookingItemInput = z.input<typeof bookingItemSchema>;

export const MAX_ITEMS_PER_BOOKING = 3;

export const createBookingSchema = z.object({
  slotId: z.coerce.number({ error: 'validation.slot.required' }).int().positive('validation.slot.required'),
  visitor: visitorSchema,
  items: z
    .array(bookingItemSchema)
    .min(1, 'validation.items.required')
    .max(MAX_ITEMS_PER_BOOKING, 'validation.items.tooMany'),
  consent: z.literal(true, { error: 'validation.consent.required' }),
});
export type CreateBookingInput = z.input<typeof createBookingSchema>;

export const moveBookingSchema = z.object({ slotId: z.coerce.number().int().positive('validation.slot.required') });

export const waitlistSchema = createBookingSchema;

export const PHOTO_LIMITS = {
  maxBytes: 8 * 1024 * 1024,
  perItem: 3,
  /** All the visitor's photos of one booking together. */
  perBooking: 6,
  types: ['image/jpeg', 'image/png', 'image/webp'] as const,
};
