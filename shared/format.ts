import { DEFAULT_LANGUAGE, type Language } from './i18n/languages';

/**
 * The Intl locale for a reader's language. English is British English: day before month, 24-hour clock, as the
 * European groups read it.
 */
export const intlLocale = (lang: Language): string => (lang === 'en' ? 'en-GB' : lang);

/**
 * One Intl.DateTimeFormat per language, time zone and kind: building one costs far more than using it (ICU loads the
 * locale's patterns), and a booking's mail or a page of sessions formats dozens of dates.
 */
const formatters = new Map<string, Intl.DateTimeFormat>();
function formatter(kind: 'day' | 'time', lang: Language, timeZone: string): Intl.DateTimeFormat {
  const key = `${kind} ${lang} ${timeZone}`;
  let f = formatters.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat(
      intlLocale(lang),
      kind === 'day'
        ? { timeZone, weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' }
        : { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' },
    );
    formatters.set(key, f);
  }
  return f;
}

/** Dates as people at the event read them: in the group's time zone, in the reader's language. */
export function formatDay(d: Date | string, timeZone: string, lang: Language = DEFAULT_LANGUAGE): string {
  return formatter('day', lang, timeZone).format(new Date(d));
}

export function formatTime(d: Date | string, timeZone: string, lang: Language = DEFAULT_LANGUAGE): string {
  return formatter('time', lang, timeZone).format(new Date(d));
}

export const formatTimeRange = (
  a: Date | string,
  b: Date | string,
  timeZone: string,
  lang: Language = DEFAULT_LANGUAGE,
) => `${formatTime(a, timeZone, lang)}–${formatTime(b, timeZone, lang)}`;

export const WHAT_TO_BRING = [
  'The broken item itself, cleaned if it has been in a kitchen or a garden.',
  'Its charger, power supply, remote or any loose parts that belong to it.',
  'What you know of the fault: what happened, when, and anything already tried.',
  'Spare parts you already bought, if any; we will tell you if one is needed.',
];

export const DISCLAIMER = [
  'Volunteers help on a best-effort basis; a repair cannot be guaranteed.',
  'You stay the owner of your item and stay with it while it is looked at.',
  'Mains items are safety-checked before they go home where local practice requires it; an item that fails is not returned as fixed.',
];

/**
 * The currencies offered first on a group's settings page (ISO 4217 codes); any code the runtime's Intl knows is
 * accepted, so a group elsewhere can still pick its own.
 */
export const COMMON_CURRENCIES = [
  'EUR',
  'GBP',
  'CHF',
  'DKK',
  'SEK',
  'NOK',
  'ISK',
  'PLN',
  'CZK',
  'HUF',
  'RON',
  'BGN',
  'USD',
  'CAD',
  'AUD',
  'NZD',
] as const;

/** Whether a code is an ISO 4217 currency the runtime can format (ECMA-402 Intl.supportedValuesOf). */
export const isKnownCurrency = (code: string) => Intl.supportedValuesOf('currency').includes(code);

/** A currency's name in words in the reader's language, e.g. "Euro" for EUR. */
export const currencyName = (code: string, lang: Language = DEFAULT_LANGUAGE) =>
  new Intl.DisplayNames([intlLocale(lang)], { type: 'currency' }).of(code) ?? code;

/** An amount of money in the group's currency as the reader writes it: €12.50 in Britain, 12,50 € in Germany. */
export const formatMoney = (amount: number, currency: string, lang: Language = DEFAULT_LANGUAGE) =>
  new Intl.NumberFormat(intlLocale(lang), { style: 'currency', currency }).format(amount);
