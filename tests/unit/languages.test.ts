import { describe, expect, it } from 'vitest';
import { formatDay, formatTimeRange } from '../../shared/format';
import { acceptLanguageTags, pickLanguage } from '../../shared/i18n/languages';

describe('choosing the reader’s language', () => {
  it('orders an Accept-Language header by quality, as RFC 9110 §12.5.4 and its example describe', () => {
    // RFC 9110 §12.5.4: "Accept-Language: da, en-gb;q=0.8, en;q=0.7" means Danish, then British English, then English.
    expect(acceptLanguageTags('da, en-gb;q=0.8, en;q=0.7')).toEqual(['da', 'en-gb', 'en']);
    // Written order out of quality order, and q=0 meaning "not acceptable" (RFC 9110 §12.4.2).
    expect(acceptLanguageTags('en;q=0.2, de-AT, nl;q=0, fr;q=0.5')).toEqual(['de-AT', 'fr', 'en']);
    expect(acceptLanguageTags('')).toEqual([]);
  });

  it('takes the first supported language by its primary subtag (BCP 47, RFC 5646), else English', () => {
    expect(pickLanguage(acceptLanguageTags('da, en-gb;q=0.8, en;q=0.7'))).toBe('en');
    expect(pickLanguage(acceptLanguageTags('nl-BE,nl;q=0.9,fr;q=0.8'))).toBe('nl');
    expect(pickLanguage(['pt-BR', 'de-CH'])).toBe('de');
    expect(pickLanguage(['fr_CA'])).toBe('fr');
    expect(pickLanguage(['pt', 'es'])).toBe('en');
    expect(pickLanguage([undefined, 'x-pseudo'], 'nl')).toBe('nl');
  });

  it('writes a session’s day and times in the reader’s language, in the group’s time zone', () => {
    // Expected strings are CLDR's long date patterns as the runtime's ICU (the reference implementation) gives them:
    // weekday first, day before month in nl/de/fr, German "5." with a period, lower-case month names in nl and fr.
    const at = '2026-12-05T10:00:00Z';
    expect(formatDay(at, 'Europe/Amsterdam')).toBe('Saturday, 5 December 2026');
    expect(formatDay(at, 'Europe/Amsterdam', 'nl')).toBe('zaterdag 5 december 2026');
    expect(formatDay(at, 'Europe/Berlin', 'de')).toBe('Samstag, 5. Dezember 2026');
    expect(formatDay(at, 'Europe/Paris', 'fr')).toBe('samedi 5 décembre 2026');
    expect(formatTimeRange(at, '2026-12-05T13:30:00Z', 'Europe/London', 'fr')).toBe('10:00–13:30');
  });
});
