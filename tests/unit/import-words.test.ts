import { describe, expect, it } from 'vitest';
import { problemWords } from '../../client/src/features/impact/components/import-words';
import { ROW_PROBLEMS, type RowProblem } from '../../shared/impact/import-problems';
import { readRecords, rowRefusal } from '../../shared/impact/ords-reader';
import type { Language } from '../../shared/i18n/languages';
import { translate } from '../../server/src/i18n';

/** The screen's t(), here from the same catalogs the browser loads. */
const tIn = (lang: Language) => (key: string, values?: Record<string, unknown>) => translate(lang, key, values);

describe('why a row of a file was left out, in the reader’s words', () => {
  it('says every problem in English word for word as the API’s English message', () => {
    for (const code of Object.keys(ROW_PROBLEMS) as RowProblem[]) {
      const r = rowRefusal(4, 'id', code, 'Mended');
      expect(problemWords(tIn('en'), r), code).toBe(r.message);
    }
    expect(rowRefusal(6, 'event_date', 'notDate', 'tomorrow').message).toBe(
      '"tomorrow" is not a date written as YYYY-MM-DD.',
    );
  });

  it('words a row’s problem in German, Dutch and French with the file’s own value', () => {
    const r = readRecords('id,repair_status,event_date\na-1,Mended,2025-01-02\na-2,Fixed,06/02/2021', {
      today: '2026-01-01',
    });
    expect(r.refused.map((x) => [x.row, x.field, x.code, x.value])).toEqual([
      [2, 'repair_status', 'unknownStatus', 'Mended'],
      [3, 'event_date', 'notDate', '06/02/2021'],
    ]);
    expect(problemWords(tIn('de'), r.refused[0])).toBe('„Mended“ ist kein Reparaturstatus, den wir kennen.');
    expect(problemWords(tIn('nl'), r.refused[1])).toBe('„06/02/2021” is geen datum in de vorm JJJJ-MM-DD.');
    expect(problemWords(tIn('fr'), rowRefusal(5, 'group_identifier', 'noGroup'))).toBe(
      'La fiche ne nomme aucun groupe.',
    );
  });

  it('keeps a file’s value as typed, even one that looks like a replacement pattern', () => {
    expect(rowRefusal(2, 'id', 'idTwice', '$&-1').message).toBe('The id $&-1 appears twice in this file.');
  });

  it('shows a refusal stored before codes by its English message', () => {
    const old = { row: 4, field: 'id', message: 'The record has no id.' };
    expect(problemWords(tIn('de'), old)).toBe('The record has no id.');
  });
});
