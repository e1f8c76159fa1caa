import { describe, expect, it } from 'vitest';
import { COMMON_CURRENCIES, currencyName, formatMoney, isKnownCurrency } from '../../shared/format';

/*
 * Expected strings: ECMA-402 Intl.NumberFormat with style "currency" in the en-GB locale, whose symbols and
 * patterns come from the Unicode CLDR (en-GB: "€" for EUR, "£" for GBP, the ISO code and a space for CHF).
 */
describe('formatMoney: part costs in the group’s currency', () => {
  it('writes euros, pounds and francs as en-GB does', () => {
    expect(formatMoney(12.5, 'EUR')).toBe('€12.50'); // ECMA-402 / CLDR en-GB
    expect(formatMoney(3, 'GBP')).toBe('£3.00'); // ECMA-402 / CLDR en-GB
    expect(formatMoney(7.5, 'CHF')).toBe('CHF\u00a07.50'); // ECMA-402 / CLDR en-GB: a no-break space after the code
    expect(formatMoney(1234.5, 'DKK')).toBe('DKK\u00a01,234.50'); // ECMA-402 / CLDR en-GB, grouping by thousands
  });

  it('agrees with Intl.NumberFormat for every currency offered', () => {
    for (const c of COMMON_CURRENCIES)
      // ECMA-402 §15 (NumberFormat): the same options give the same string.
      expect(formatMoney(99.95, c)).toBe(
        new Intl.NumberFormat('en-GB', { style: 'currency', currency: c }).format(99.95),
      );
  });

  it('knows ISO 4217 codes and names them', () => {
    expect(COMMON_CURRENCIES.every(isKnownCurrency)).toBe(true); // ECMA-402 Intl.supportedValuesOf('currency')
    expect(isKnownCurrency('XYZ')).toBe(false); // not an ISO 4217 code
    expect(currencyName('EUR')).toBe('Euro'); // CLDR en-GB display name (ECMA-402 Intl.DisplayNames)
  });
});
