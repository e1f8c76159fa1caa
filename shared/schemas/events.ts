import { LANGUAGES } from '../i18n/languages';
import { RETENTION_MONTHS } from '../privacy/scrub';
import { z } from 'zod';
import { SKILLS } from '../constants';
import { isKnownCurrency } from '../format';
import { isKnownCountry } from '../places/countries';

const isoInstant = (error: string) => z.iso.datetime({ offset: true, error }).transform((s) => new Date(s));

export const skillLimitsSchema = z
  .partialRecord(z.enum(SKILLS), z.number().int().min(0, 'validation.skillLimit.negative').max(500))
  .default({});

const eventFields = {
  title: z.string({ error: 'validation.event.title' }).trim().min(3, 'validation.event.titleShort').max(160),
  venueId: z.coerce.number({ error: 'validation.venue.required' }).int().positive('validation.venue.required'),
  startsAt: isoInstant('validation.event.startFormat'),
  endsAt: isoInstant('validation.event.endFormat'),
  slotMinutes: z.coerce
    .number({ error: 'validation.slot.minutes' })
    .int('validation.slot.wholeMinutes')
    .min(5, 'validation.slot.tooShort')
    .max(240, 'validation.slot.tooLong'),
  slotCapacity: z.coerce
    .number({ error: 'validation.slot.capacity' })
    .int('validation.number.whole')
    .min(0, 'validation.capacity.negative')
    .max(200),
  skillLimits: skillLimitsSchema,
  description: z.string().trim().max(4000).default(''),
};

// Zod runs an object's refinements even when a field failed, so they see the raw value then: check it is a date.
const isDate = (d: unknown): d is Date => d instanceof Date && !Number.isNaN(d.getTime());
const endAfterStart = (v: { startsAt?: unknown; endsAt?: unknown }) =>
  !isDate(v.startsAt) || !isDate(v.endsAt) || v.endsAt > v.startsAt;
const sameDayish = (v: { startsAt?: unknown; endsAt?: unknown }) =>
  !isDate(v.startsAt) || !isDate(v.endsAt) || v.endsAt.getTime() - v.startsAt.getTime() <= 16 * 3600_000;

export const createEventSchema = z
  .object({ groupId: z.coerce.number({ error: 'validation.group.required' }).int().positive(), ...eventFields })
  .refine(endAfterStart, { path: ['endsAt'], message: 'validation.event.endAfterStart' })
  .refine(sameDayish, { path: ['endsAt'], message: 'validation.event.tooLong' });
export type CreateEventInput = z.input<typeof createEventSchema>;

export const updateEventSchema = z
  .object(eventFields)
  .partial()
  .refine(endAfterStart, { path: ['endsAt'], message: 'validation.event.endAfterStart' })
  .refine(sameDayish, { path: ['endsAt'], message: 'validation.event.tooLong' });

export const slotUpdateSchema = z.object({
  capacity: z.coerce.number().int('validation.number.whole').min(0, 'validation.capacity.negative').max(200),
});

export const eventListQuery = z.object({
  from: z.iso.datetime({ offset: true }).optional(),
  to: z.iso.datetime({ offset: true }).optional(),
  groupId: z.coerce.number().int().positive().optional(),
  categoryId: z.coerce.number().int().positive().optional(),
});

export const venueSchema = z.object({
  groupId: z.coerce.number().int().positive(),
  name: z.string().trim().min(2, 'validation.venue.name').max(160),
  address: z.string().trim().min(3, 'validation.venue.address').max(255),
  town: z.string().trim().min(1, 'validation.town.required').max(120),
  accessNotes: z.string().trim().max(2000).default(''),
});

/** An ISO 4217 code that Intl can format; lower case is taken as meant. */
export const currencyCode = z.string().trim().toUpperCase().refine(isKnownCurrency, 'validation.currency.unknown');

/** A country by its ISO 3166-1 alpha-3 code (the form the Open Repair Data file writes). */
export const countryCode = z.string().trim().toUpperCase().refine(isKnownCountry, 'validation.country.unknown');

/** The group's settings; each part is saved only when it is sent. */
export const groupSettingsSchema = z.object({
  houseRules: z.string().trim().max(6000).optional(),
  excludedCategoryIds: z.array(z.number().int().positive()).max(200).optional(),
  currency: currencyCode.optional(),
  country: countryCode.optional(),
  /** The language of the group's mails and public pages when the visitor's own is not known. */
  defaultLanguage: z.enum(LANGUAGES, { error: 'validation.language.unknown' }).optional(),
  /** Months after a session that visitors' details are kept; then the daily job anonymises them. */
  retentionMonths: z.coerce
    .number({ message: 'validation.retention.number' })
    .int('validation.retention.whole')
    .min(RETENTION_MONTHS.min, 'validation.retention.range')
    .max(RETENTION_MONTHS.max, 'validation.retention.range')
    .optional(),
  /** Where visitors write about their details; '' for none. */
  contactEmail: z
    .string()
    .trim()
    .max(254)
    .refine((s) => s === '' || z.string().email().safeParse(s).success, 'validation.contactEmail.invalid')
    .optional(),
});
