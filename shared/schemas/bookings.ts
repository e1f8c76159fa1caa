import { z } from 'zod';
import { HAZARDS } from '../constants';
import { email } from './auth';

export const visitorSchema = z.object({
  name: z
    .string({ error: 'Enter your name.' })
    .trim()
    .min(1, 'Enter your name.')
    .max(120, 'Use at most 120 characters.'),
  email,
  phone: z
    .string()
    .trim()
    .max(40)
    .regex(/^[+0-9 ()-]*$/, 'Use digits, spaces, + and brackets only.')
    .optional()
    .transform((v) => v || undefined),
});

/** Asking for a fresh manage link for every current booking of an e-mail address. */
export const freshLinkSchema = z.object({ email });
export type FreshLinkInput = z.input<typeof freshLinkSchema>;

export const bookingItemSchema = z.object({
  categoryId: z.coerce
    .number({ error: 'Choose what kind of item it is.' })
    .int()
    .positive('Choose what kind of item it is.'),
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
    z.coerce.number().int('Use whole years.').min(0, 'Age cannot be negative.').max(150).optional(),
  ),
  fault: z
    .string({ error: 'Describe what is wrong.' })
    .trim()
    .min(5, 'Describe what is wrong in a few words.')
    .max(2000, 'Keep it under 2000 characters.'),
  mains: z.boolean().optional(),
  battery: z.boolean().optional(),
  hazards: z.array(z.enum(HAZARDS)).max(HAZARDS.length).default([]),
});
export type BookingItemInput = z.input<typeof bookingItemSchema>;

export const MAX_ITEMS_PER_BOOKING = 3;

export const createBookingSchema = z.object({
  slotId: z.coerce.number({ error: 'Choose a time.' }).int().positive('Choose a time.'),
  visitor: visitorSchema,
  items: z
    .array(bookingItemSchema)
    .min(1, 'Add the item you are bringing.')
    .max(MAX_ITEMS_PER_BOOKING, `Book at most ${MAX_ITEMS_PER_BOOKING} items at once.`),
  consent: z.literal(true, { error: 'Tick the box to accept the house rules.' }),
});
export type CreateBookingInput = z.input<typeof createBookingSchema>;

export const moveBookingSchema = z.object({ slotId: z.coerce.number().int().positive('Choose a time.') });

export const waitlistSchema = createBookingSchema;

export const PHOTO_LIMITS = {
  maxBytes: 8 * 1024 * 1024,
  perItem: 3,
  /** All the visitor's photos of one booking together. */
  perBooking: 6,
  types: ['image/jpeg', 'image/png', 'image/webp'] as const,
};
