import { formatOhms } from '../../../../../shared/calculators/resistors';
import type { Language } from '../../../../../shared/i18n/languages';

/** A bench figure as the language writes it (a decimal comma in nl, de and fr), at most `dp` decimals, no grouping. */
export const formatNumber = (x: number, lang: Language, dp = 3): string =>
  new Intl.NumberFormat(lang, { maximumFractionDigits: dp, useGrouping: false }).format(x);

/** A resistance as the shared calculators write it (4.7 kΩ), with the language's decimal sign. */
export const formatOhmsIn = (value: number, lang: Language): string =>
  formatOhms(value).replace(/^-?\d+(?:\.\d+)?/, (d) => formatNumber(Number(d), lang, 6));

/** Every English decimal point in a figure-bearing text turned into the language's sign (digits either side only). */
export const decimalsIn = (text: string, lang: Language): string =>
  lang === 'en' ? text : text.replace(/(\d)\.(\d)/g, `$1${formatNumber(1.5, lang).charAt(1)}$2`);
