import countries from 'i18n-iso-countries';

/**
 * Countries by ISO 3166-1 alpha-3 code (the code list comes from the i18n-iso-countries package). Names come from
 * the browser's or Node's own `Intl.DisplayNames`, so no name list is shipped.
 */
export const isKnownCountry = (code: string) => countries.alpha3ToAlpha2(code) !== undefined;

/** The country's name in the reader's language, e.g. NLD → "Netherlands"; the code itself when unknown. */
export function countryName(alpha3: string, locale = 'en'): string {
  const alpha2 = countries.alpha3ToAlpha2(alpha3);
  if (!alpha2) return alpha3;
  return new Intl.DisplayNames([locale], { type: 'region', fallback: 'code' }).of(alpha2) ?? alpha3;
}

/** Every country as code and name, sorted by name in the reader's language. */
export function countryChoices(locale = 'en'): { code: string; name: string }[] {
  return Object.keys(countries.getAlpha3Codes())
    .map((code) => ({ code, name: countryName(code, locale) }))
    .sort((a, b) => a.name.localeCompare(b.name, locale));
}
