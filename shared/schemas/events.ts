import { LANGUAGES } from '../i18n/languages';
import { RETENTION_MONTHS } from '../privacy/scrub';
import { z } from 'zod';
import { SKILLS } from '../constants';
import { isKnownCurrency } from '../format';
import { isKnownCountry } from '../places/countries';

const isoInstant = (label: string) =>
  z.iso.datetime({ offset: true, error: `${label} must be a date and time (ISO 8601).` }).transform((s) => new Date(s));

export const skillLimitsSchema = z
  .partialRecord(z.enum(SKILLS), z.number().int().min(0, 'A limit cannot be negative.').max(500))
  .default({});

const eventFields = {
  title: z
    .string({ error: 'Give the event a title.' })
    .trim()
    .min(3, 'Give the event a title of at least 3 characters.')
    .max(160),
  venueId: z.coerce.number({ error: 'Choose a venue.' }).int().positive('Choose a venue.'),
  startsAt: isoInstant('The start'),
  endsAt: isoInstant('The end'),
  slotMinutes: z.coerce
    .number({ error: 'Enter the slot length in minutes.' })
    .int('Use whole minutes.')
    .min(5, 'Slots must be at least 5 minutes long.')
    .max(240, 'Slots can be at most 4 hours long.'),
  slotCapacity: z.coerce
    .number({ error: 'Enter how many items can start per slot.' })
    .int('Use a whole number.')
    .min(0, 'Capacity cannot be negative.')
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
  .object({ groupId: z.coerce.number({ error: 'Choose a group.' }).int().positive(), ...eventFields })
  .refine(endAfterStart, { path: ['endsAt'], message: 'The event must end after it starts.' })
  .refine(sameDayish, { path: ['endsAt'], message: 'An event lasts at most 16 hours.' });
export type CreateEventInput = z.input<typeof createEventSchema>;

export const updateEventSchema = z
  .object(eventFields)
  .partial()
  .refine(endAfterStart, { path: ['endsAt'], message: 'The event must end after it starts.' })
  .refine(sameDayish, { path: ['endsAt'], message: 'An event lasts at most 16 hours.' });

export const slotUpdateSchema = z.object({
  capacity: z.coerce.number().int('Use a whole number.').min(0, 'Capacity cannot be negative.').max(200),
});

export const eventListQuery = z.object({
  from: z.iso.datetime({ offset: true }).optional(),
  to: z.iso.datetime({ offset: true }).optional(),
  groupId: z.coerce.number().int().positive().optional(),
  categoryId: z.coerce.number().int().positive().optional(),
});

export const venueSchema = z.object({
  groupId: z.coerce.number().int().positive(),
  name: z.string().trim().min(2, 'Give the venue a name.').max(160),
  address: z.string().trim().min(3, 'Enter the street address.').max(255),
  town: z.string().trim().min(1, 'Enter the town.').max(120),
  accessNotes: z.string().trim().max(2000).default(''),
});

/** An ISO 4217 code that Intl can format; lower case is taken as meant. */
export const currencyCode = z
  .string()
  .trim()
  .toUpperCase()
  .refine(isKnownCurrency, 'Choose a currency by its three-letter code, e.g. EUR or GBP.');

/** A country by its ISO 3166-1 alpha-3 code (the form the Open Repair Data file writes). */
export const countryCode = z.string().trim().toUpperCase().refine(isKnownCountry, 'Choose a country from the list.');

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
    .number({ message: 'Enter a number of months.' })
    .int('Enter a whole number of months.')
    .min(RETENTION_MONTHS.min, `Keep details for ${RETENTION_MONTHS.min} to ${RETENTION_MONTHS.max} months.`)
    .max(RETENTION_MONTHS.max, `Keep details for ${RETENTION_MONTHS.min} to ${RETENTION_MONTHS.max} months.`)
    .optional(),
  /** Where visitors write about their details; '' for none. */
  contactEmail: z
    .string()
    .trim()
    .max(254)
    .refine((s) => s === '' || z.string().email().safeParse(s).success, 'Enter an e-mail address, or leave it empty.')
    .optional(),
});
