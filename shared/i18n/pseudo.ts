/**
 * The pseudo-locale: English words with accented letters and about 35 % more length, so a screen that would cut or
 * overflow a longer language shows it in a browser test. Only reachable with `?lang=xx-pseudo`; never picked for a
 * visitor, never offered in the picker.
 */
export const PSEUDO_LANGUAGE = 'xx-pseudo';

const ACCENTED: Record<string, string> = {
  a: 'à',
  e: 'é',
  i: 'ï',
  o: 'ö',
  u: 'ü',
  c: 'ç',
  n: 'ñ',
  y: 'ý',
  A: 'Å',
  E: 'É',
  I: 'Î',
  O: 'Ø',
  U: 'Ü',
  C: 'Ç',
  N: 'Ñ',
  Y: 'Ý',
};

/** One piece of message text (never a placeholder): accents on every letter that has one, vowels doubled until ≥ 35 % longer. */
export function pseudoText(text: string): string {
  if (!text.trim()) return text;
  const target = Math.ceil(text.length * 1.35);
  let out = '';
  let extra = text.length;
  for (const ch of text) {
    out += ACCENTED[ch] ?? ch;
    // Double a vowel while the text is still short of its target length.
    if ('aeiouAEIOU'.includes(ch) && extra < target) {
      out += ACCENTED[ch];
      extra++;
    }
  }
  return extra < target ? `${out} ${'~'.repeat(Math.max(1, target - extra - 1))}` : out;
}
