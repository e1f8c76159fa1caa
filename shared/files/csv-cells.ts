/**
 * A text cell that a spreadsheet would read as a formula (it starts with = + - @, a tab or a carriage return) gets
 * a leading apostrophe, so Excel, LibreOffice and Google Sheets show it as text and never run it. Numbers are not
 * text cells and stay as they are. Every CSV the product writes passes its text cells through this.
 */
export const FORMULA_START = /^[=+\-@\t\r]/;

export const safeCsvText = (value: string): string => (FORMULA_START.test(value) ? `'${value}` : value);

/** csv-stringify's `cast` option that applies it to every string cell. */
export const safeCsvCast = { string: safeCsvText } as const;
