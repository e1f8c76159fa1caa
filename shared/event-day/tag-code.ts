import { REFERENCE_ALPHABET } from '../booking/reference';

/**
 * Intake tag codes: five characters from the same unambiguous alphabet as booking references (no 0/O, no 1/I),
 * about 33 million codes, short enough to read across a bench.
 */
export const TAG_CODE_LENGTH = 5;
export const TAG_CODE_PATTERN = /^[2-9A-HJ-NP-Z]{5}$/;

export function formatTagCode(bytes: Uint8Array): string {
  if (bytes.length < TAG_CODE_LENGTH) throw new RangeError('A tag code needs five random bytes.');
  return Array.from(bytes.slice(0, TAG_CODE_LENGTH), (b) => REFERENCE_ALPHABET[b & 31]).join('');
}

export function normaliseTagCode(input: string): string | null {
  const cleaned = input.toUpperCase().replace(/[\s-]/g, '');
  return TAG_CODE_PATTERN.test(cleaned) ? cleaned : null;
}

/** The URL a tag's QR code holds; any phone camera opens it. */
export const tagUrl = (publicUrl: string, code: string) => `${publicUrl.replace(/\/$/, '')}/t/${code}`;

/** "Orla Whitcombe" → "Orla W." — all a tag or a fixer needs. */
export function shortName(full: string): string {
  const parts = full.trim().split(/\s+/).filter(Boolean);
  if (parts.length === 0) return '';
  if (parts.length === 1) return parts[0];
  return `${parts[0]} ${parts[parts.length - 1][0].toUpperCase()}.`;
}

/** Reads a scanned booking QR (`…/b/K7M-2QD`), a tag URL (`…/t/K7M4Q`) or typed text. */
export function readScan(text: string): { kind: 'booking'; reference: string } | { kind: 'tag'; code: string } | null {
  const t = text.trim();
  const url = /\/(b|t)\/([A-Za-z0-9-]+)\/?(?:[?#].*)?$/.exec(t);
  const raw = url ? url[2] : t;
  const kind = url?.[1];
  const cleaned = raw.toUpperCase().replace(/[\s-]/g, '');
  if (kind !== 't' && cleaned.length === 6 && /^[2-9A-HJ-NP-Z]{6}$/.test(cleaned))
    return { kind: 'booking', reference: `${cleaned.slice(0, 3)}-${cleaned.slice(3)}` };
  if (kind !== 'b' && TAG_CODE_PATTERN.test(cleaned)) return { kind: 'tag', code: cleaned };
  return null;
}
