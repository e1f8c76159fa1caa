import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { describe, expect, it } from 'vitest';
import { safeCsvCast, safeCsvText } from '../../shared/files/csv-cells';

/**
 * Source: OWASP, "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection): cells that begin with
 * = + - @, tab (0x09) or carriage return (0x0D) are read as formulas; prefix them with a single quote so the
 * spreadsheet shows them as text. The examples are OWASP's own kind (from memory): =HYPERLINK, +cmd, @SUM, -2+3.
 */
describe('CSV cells a spreadsheet would run', () => {
  it('get a leading apostrophe when they start with = + - @, tab or CR', () => {
    expect(safeCsvText('=HYPERLINK("http://example.org/","click")')).toBe(
      '\'=HYPERLINK("http://example.org/","click")',
    );
    expect(safeCsvText("+cmd|' /C calc'!A0")).toBe("'+cmd|' /C calc'!A0");
    expect(safeCsvText('-2+3')).toBe("'-2+3");
    expect(safeCsvText('@SUM(1+1)')).toBe("'@SUM(1+1)");
    expect(safeCsvText('\t=1')).toBe("'\t=1");
    expect(safeCsvText('\r=1')).toBe("'\r=1");
  });

  it('leave ordinary text alone, formula signs inside the text included', () => {
    for (const s of ['Kettle', 'Fuse blew: 13 A', 'a=b', 'x+y', '', ' =1 (leading space)', "'quoted"])
      expect(safeCsvText(s)).toBe(s);
  });

  it('apply to every text cell through csv-stringify, and numbers stay numbers', () => {
    const text = stringify([{ brand: '+cmd', model: '=1+1', kg: -1.5, age: 3 }], {
      header: true,
      cast: safeCsvCast,
    });
    const [row] = parse(text, { columns: true }) as Record<string, string>[];
    expect(row).toEqual({ brand: "'+cmd", model: "'=1+1", kg: '-1.5', age: '3' });
  });
});
