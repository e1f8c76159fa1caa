import { isOhms, isTerm, quantityText, type Said, type SaidValue } from '../../../../../shared/calculators/said';
import type { Language } from '../../../../../shared/i18n/languages';
import { tr } from '../../../lib/i18n';
import { formatNumber, formatOhmsIn } from './numbers';

/** A value of a sentence in the reader's language: its figures with the language's decimal sign, its words translated. */
function valueIn(v: SaidValue, lang: Language): string {
  const figure = (n: number) => formatNumber(n, lang, 12);
  if (typeof v === 'string') return v;
  if (typeof v === 'number') return figure(v);
  if (isTerm(v)) return tr(`bench.${v.term}`);
  if (isOhms(v)) return formatOhmsIn(v.ohms, lang);
  return quantityText(v, figure);
}

/**
 * What the shared calculators and the salvage match say (shared/calculators/said: a code and its values) in the
 * reader's language, from `bench.<code>`. A plain text (an error that is not the calculators') comes as it is.
 */
export function saidIn(s: Said | string, lang: Language): string {
  if (typeof s === 'string') return s;
  return tr(`bench.${s.code}`, Object.fromEntries(Object.entries(s.values).map(([k, v]) => [k, valueIn(v, lang)])));
}
