/**
 * Booking references and tag codes read aloud across a noisy hall: no 0/O and no 1/I, so nothing can be
 * mistaken. 32 symbols, six of them in two groups of three: about a billion references.
 */
export const REFERENCE_ALPHABET = '23456789ABCDEFGHJKLMNPQRSTUVWXYZ';
export const REFERENCE_PATTERN = /^[2-9A-HJ-NP-Z]{3}-[2-9A-HJ-NP-Z]{3}$/;

/** Builds a reference from six random bytes (the caller brings the randomness, so this stays pure). */
export function formatReference(bytes: Uint8Array): string {
  if (bytes.length < 6) throw new RangeError('A reference needs six random bytes.');
  const chars = Array.from(bytes.slice(0, 6), (b) => REFERENCE_ALPHABET[b & 31]);
  return `${chars.slice(0, 3).join('')}-${chars.slice(3).join('')}`;
}

/** Reads what a person typed: any case, with spaces or without the hyphen. Returns null for anything else. */
export function normaliseReference(input: string): string | null {
  const cleaned = input.toUpperCase().replace(/[\s-]/g, '');
  if (cleaned.length !== 6) return null;
  const ref = `${cleaned.slice(0, 3)}-${cleaned.slice(3)}`;
  return REFERENCE_PATTERN.test(ref) ? ref : null;
}
