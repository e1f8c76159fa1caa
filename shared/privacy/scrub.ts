import { subMonths } from 'date-fns';

/**
 * Personal data out of free text a visitor or volunteer typed (a fault, a note): e-mail addresses, phone numbers
 * and the given names become placeholders; what the text says about the thing stays.
 */
const EMAIL = /[\w.+-]+@[\w-]+(?:\.[\w-]+)+/g;
/** Seven or more digits, with the spaces, dots, dashes and brackets people write numbers with. */
const PHONE = /\+?\(?\d[\d ().-]{5,}\d/g;
const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

export function scrubPersonalData(text: string, names: readonly string[] = []): string {
  let out = text.replace(EMAIL, '[e-mail]').replace(PHONE, (m) => (m.replace(/\D/g, '').length >= 7 ? '[number]' : m));
  // The whole name first, then each part of it of three letters or more (a visitor may sign with a first name).
  const parts = names
    .flatMap((n) => [n.trim(), ...n.trim().split(/\s+/)])
    .filter((p) => p.length >= 3)
    .sort((a, b) => b.length - a.length);
  for (const p of new Set(parts))
    out = out.replace(new RegExp(`(?<![\\p{L}\\p{N}])${escape(p)}(?![\\p{L}\\p{N}])`, 'giu'), '[name]');
  return out;
}

/** The name kept on a booking whose visitor's data has been erased. */
export const ERASED_NAME = 'Erased';

/** Retention choices a group can make, in months after the session. */
export const RETENTION_MONTHS = { min: 1, max: 120, default: 12 } as const;

/** Sessions that ended before this instant have passed the retention period of `months` (calendar months). */
export const retentionCutoff = (now: Date, months: number): Date => subMonths(now, months);
