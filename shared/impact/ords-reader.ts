import { parse } from 'csv-parse/sync';
import type { Barrier } from '../event-day/constants';
import { IMPORT_FIELDS, ORDS_BARRIER, ORDS_REPAIR_STATUS, REQUIRED_FIELDS, type ImportField } from './open-repair-data';
import { ORDS_PRODUCT_CATEGORIES, ordsCategoryId, type OrdsProductCategory } from './ords-categories';
import type { RepairStatus } from './visits';
import { ROW_PROBLEMS, type RowProblem } from './import-problems';

/**
 * Reads a file of repair records: Open Repair Data v0.3 or v0.2, or a plain spreadsheet whose columns an organiser
 * matched to ours. Pure: bytes in, records and refusals out. Each refusal names its row (the file's line number,
 * header = 1), field and reason, in Mendery's words; good rows are kept.
 */
export { IMPORT_FIELDS, REQUIRED_FIELDS, type ImportField } from './open-repair-data';

export type FileKind = 'ords-0.3' | 'ords-0.2' | 'plain';

export interface ImportedRecord {
  row: number;
  /** The record's key: data provider and its id, so a second import of the same file adds nothing. */
  provider: string;
  recordId: string;
  country: string | null;
  partnerCategory: string | null;
  /** The standard's category as the file wrote it (kept, so a re-export gives it back), or null. */
  ordsCategory: string | null;
  ordsCategoryId: number | null;
  powered: boolean;
  brand: string | null;
  yearOfManufacture: number | null;
  ageYears: number | null;
  status: RepairStatus | 'unknown';
  barrier: Barrier | null;
  group: string | null;
  eventDate: string;
  problem: string;
}
export { ROW_PROBLEMS, type RowProblem } from './import-problems';

export interface Refusal {
  row: number;
  field: string;
  code: RowProblem;
  /** The file's text the problem is about, cut short; absent when the problem has none. */
  value?: string;
  /** The problem in English, for API readers and refusals stored before codes. */
  message: string;
}

/** A row's refusal: its code, the file's value, and the English message made from them. */
export function rowRefusal(row: number, field: string, code: RowProblem, value?: string): Refusal {
  const message = ROW_PROBLEMS[code].replace('{value}', () => value ?? '');
  return { row, field, code, ...(value === undefined ? {} : { value }), message };
}
export interface ReadResult {
  kind: FileKind;
  encoding: 'utf-8' | 'windows-1252';
  delimiter: ',' | ';';
  records: ImportedRecord[];
  refused: Refusal[];
  total: number;
}

/**
 * A file-level refusal: nothing in the file can be read. `code` names it in the server-only `problems` catalog
 * (problems.<code>, whose English is `message`), with `values` for its placeholders.
 */
export class UnreadableFile extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly values: Record<string, string | number> = {},
  ) {
    super(message);
  }
}

/**
 * UTF-8 (with or without a byte-order mark) when the bytes are valid UTF-8; otherwise Windows-1252, the encoding
 * spreadsheet programs on Windows write, so accented names arrive intact. A file with NUL bytes is no CSV.
 */
export function decodeCsv(bytes: Uint8Array): { text: string; encoding: 'utf-8' | 'windows-1252' } {
  if (bytes.includes(0))
    throw new UnreadableFile('notCsv', 'This file is not a CSV file. Save the sheet as CSV and try again.');
  try {
    return { text: new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes), encoding: 'utf-8' };
  } catch {
    return { text: new TextDecoder('windows-1252').decode(bytes), encoding: 'windows-1252' };
  }
}

const STATUS_BY_TEXT = new Map<string, RepairStatus | 'unknown'>(
  Object.entries(ORDS_REPAIR_STATUS).flatMap(([k, v]) => [
    [v.text.toLowerCase(), k as RepairStatus | 'unknown'],
    [String(v.code), k as RepairStatus | 'unknown'],
  ]),
);
const BARRIER_BY_TEXT = new Map<string, Barrier>([
  ...Object.entries(ORDS_BARRIER).flatMap(([k, v]) => [
    [v.text.toLowerCase(), k as Barrier] as const,
    [String(v.code), k as Barrier] as const,
  ]),
  // The 2025-07 table schema spells code 6 "Too worn out"; the standard's text says "Item too worn out" (REFERENCE §5).
  ['too worn out', 'too-worn-out'],
]);
const CATEGORY_BY_TEXT = new Map(ORDS_PRODUCT_CATEGORIES.map((c) => [c.toLowerCase(), c]));

/** The kind of file, from its header: v0.3 has product_category_id; v0.2 has the standard's columns without it. */
export function fileKind(header: string[]): FileKind {
  const h = new Set(header.map((x) => x.trim().toLowerCase()));
  if (h.has('product_category_id') && h.has('repair_status') && h.has('id')) return 'ords-0.3';
  if (h.has('repair_status') && h.has('id') && h.has('event_date')) return 'ords-0.2';
  return 'plain';
}

/** The header and first rows, for the screen where an organiser matches a plain sheet's columns. */
export function preview(text: string, rows = 5): { delimiter: ',' | ';'; header: string[]; rows: string[][] } {
  const delimiter = delimiterOf(text);
  const all = parseRows(text, delimiter, rows + 1);
  if (!all.length) throw new UnreadableFile('fileEmpty', 'This file is empty.');
  return { delimiter, header: all[0], rows: all.slice(1) };
}

function delimiterOf(text: string): ',' | ';' {
  const first = text.replace(/^\uFEFF/, '').split(/\r?\n/, 1)[0] ?? '';
  return (first.match(/;/g)?.length ?? 0) > (first.match(/,/g)?.length ?? 0) ? ';' : ',';
}

function parseRows(text: string, delimiter: string, toLine?: number): string[][] {
  try {
    return parse(text, {
      bom: true,
      delimiter,
      relax_column_count: true,
      skip_empty_lines: true,
      trim: true,
      ...(toLine ? { to_line: toLine } : {}),
    }) as string[][];
  } catch (e) {
    const line = (e as { lines?: number }).lines;
    throw line
      ? new UnreadableFile(
          'csvUnreadableNear',
          `This file could not be read as CSV (near line ${line}). Save the sheet as CSV and try again.`,
          { line },
        )
      : new UnreadableFile('csvUnreadable', 'This file could not be read as CSV. Save the sheet as CSV and try again.');
  }
}

const isRealDate = (s: string) => {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(s)) return false;
  const d = new Date(`${s}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
};

/**
 * Reads every row. `mapping` names, for a plain sheet, which of its columns holds each of our fields; a file of the
 * standard maps itself. `today` (YYYY-MM-DD) bounds event dates: a repair cannot have happened in the future.
 */
export function readRecords(
  text: string,
  opts: { mapping?: Partial<Record<ImportField, string>>; today: string; defaultProvider?: string },
): Omit<ReadResult, 'encoding'> {
  const delimiter = delimiterOf(text);
  const rows = parseRows(text, delimiter);
  if (rows.length < 2) throw new UnreadableFile('noRecords', 'This file has a header but no records.');
  const header = rows[0].map((h) => h.trim());
  const kind = fileKind(header);
  // A column named like one of ours is matched to it unless the organiser matched another.
  const byName = Object.fromEntries(IMPORT_FIELDS.filter((f) => header.includes(f)).map((f) => [f, f]));
  const mapping: Partial<Record<ImportField, string>> = kind === 'plain' ? { ...byName, ...opts.mapping } : byName;
  const missing = REQUIRED_FIELDS.filter((f) => !mapping[f] || !header.includes(mapping[f]!));
  if (missing.length) {
    const fields = missing.join(', ');
    throw kind === 'plain'
      ? new UnreadableFile('matchColumns', `Match a column to each of: ${fields}.`, { fields })
      : new UnreadableFile('missingColumns', `The file has no ${fields} column.`, { fields });
  }
  const col = Object.fromEntries(
    IMPORT_FIELDS.map((f) => [f, mapping[f] ? header.indexOf(mapping[f]!) : -1]),
  ) as Record<ImportField, number>;

  const records: ImportedRecord[] = [];
  const refused: Refusal[] = [];
  const seen = new Set<string>();
  rows.slice(1).forEach((cells, i) => {
    const row = i + 2;
    const get = (f: ImportField) => (col[f] >= 0 ? (cells[col[f]] ?? '').trim() : '');
    const refuse = (field: ImportField, code: RowProblem, value?: string) =>
      void refused.push(rowRefusal(row, field, code, value));
    const provider = get('data_provider') || opts.defaultProvider || '';
    const recordId = get('id');
    if (!recordId) return refuse('id', 'noId');
    if (recordId.length > 80) return refuse('id', 'idTooLong');
    if (provider.length > 80) return refuse('data_provider', 'providerTooLong');
    const key = `${provider}\u0000${recordId}`;
    if (seen.has(key)) return refuse('id', 'idTwice', recordId);
    const eventDate = get('event_date');
    if (!isRealDate(eventDate)) return refuse('event_date', 'notDate', eventDate.slice(0, 40));
    if (eventDate > opts.today) return refuse('event_date', 'futureDate', eventDate);
    const status = STATUS_BY_TEXT.get(get('repair_status').toLowerCase());
    if (!status) return refuse('repair_status', 'unknownStatus', get('repair_status').slice(0, 40));
    const barrierText = get('repair_barrier_if_end_of_life');
    const barrier = barrierText ? BARRIER_BY_TEXT.get(barrierText.toLowerCase()) : null;
    if (barrier === undefined)
      return refuse('repair_barrier_if_end_of_life', 'unknownBarrier', barrierText.slice(0, 40));
    const categoryText = get('product_category');
    const unpowered = /^unpowered\b/i.test(categoryText);
    const category = CATEGORY_BY_TEXT.get(categoryText.toLowerCase()) as OrdsProductCategory | undefined;
    if (categoryText && !category && !unpowered && kind !== 'plain')
      return refuse('product_category', 'unknownCategory', categoryText.slice(0, 40));
    const age = numberOrNull(get('product_age'));
    if (age === undefined || (age !== null && (age < 0 || age > 150)))
      return refuse('product_age', 'notAge', get('product_age').slice(0, 20));
    const year = numberOrNull(get('year_of_manufacture'));
    if (
      year === undefined ||
      (year !== null && (!Number.isInteger(year) || year < 1800 || year > Number(opts.today.slice(0, 4))))
    )
      return refuse('year_of_manufacture', 'notYear', get('year_of_manufacture').slice(0, 20));
    seen.add(key);
    records.push({
      row,
      provider,
      recordId,
      country: get('country').toUpperCase() || null,
      partnerCategory: get('partner_product_category') || (kind === 'plain' ? categoryText || null : null),
      ordsCategory: category ?? (unpowered ? categoryText : null),
      ordsCategoryId: category ? ordsCategoryId(category) : null,
      powered: !unpowered,
      brand: get('brand') || null,
      yearOfManufacture: year,
      ageYears: age ?? (year !== null ? Math.max(0, Number(eventDate.slice(0, 4)) - year) : null),
      status,
      barrier: status === 'end-of-life' ? barrier : null,
      group: get('group_identifier') || null,
      eventDate,
      problem: get('problem').slice(0, 2000),
    });
  });
  return { kind, delimiter, records, refused, total: rows.length - 1 };
}

/** A number written with a point or a comma; null when empty; undefined when it is no number. */
function numberOrNull(s: string): number | null | undefined {
  if (!s) return null;
  const n = Number(s.replace(',', '.'));
  return Number.isFinite(n) ? n : undefined;
}
