import { IMPORT_FIELDS } from '../../../../../shared/impact/open-repair-data';
import { ROW_PROBLEMS } from '../../../../../shared/impact/import-problems';

type T = (key: string, values?: Record<string, unknown>) => string;

/**
 * Our own words for the fields a file brings (catalog keys figures.import.field.<field>); the standard's column
 * names stay in the file. A field we do not know is shown by its column name.
 */
export const fieldWord = (t: T, field: string): string =>
  (IMPORT_FIELDS as readonly string[]).includes(field) ? t(`figures.import.field.${field}`) : field;

/** What kind of file the preview found, in words. */
export const kindWord = (t: T, kind: string): string =>
  t(`figures.import.kind.${kind === 'ords-0.3' || kind === 'ords-0.2' ? 'ords' : 'plain'}`, {
    version: kind.replace('ords-', ''),
  });

/**
 * Why a row was left out, in the reader's words (figures.import.problem.<code>) with the file's own value. A refusal
 * stored before codes has only its English message, shown as it is.
 */
export const problemWords = (t: T, e: { code?: string; value?: string; message: string }): string =>
  e.code && e.code in ROW_PROBLEMS ? t(`figures.import.problem.${e.code}`, { value: e.value ?? '' }) : e.message;
