import { describe, expect, it } from 'vitest';
import { decodeCsv, fileKind, preview, readRecords, UnreadableFile } from '../../shared/impact/ords-reader';

const V03 =
  'id,data_provider,country,partner_product_category,product_category,product_category_id,brand,year_of_manufacture,product_age,repair_status,repair_barrier_if_end_of_life,group_identifier,event_date,problem';
const today = '2026-12-04';
const read = (text: string, mapping?: Record<string, string>) => readRecords(text, { today, mapping });

describe('reading a file of repair records', () => {
  it('reads Open Repair Data v0.3 rows into records, with the codelist texts mapped to stored values', () => {
    // Source: REFERENCE.md §5, ORDS v0.3 columns and the repair_status / barrier / product_category codelists.
    const r = read(
      [
        V03,
        'kestle-1,Kestle Network,GBR,Kettle,Kettle,14,Brewmatic,2019,7,Fixed,,kestle-menders,2026-03-14,Switch broken',
        'kestle-2,Kestle Network,GBR,Radio,Portable radio,23,,,,End of life,Spare parts not available,kestle-menders,2026-03-14,No sound',
        'kestle-3,Kestle Network,GBR,Bike,Unpowered - Bicycle,,,,,Repairable,,kestle-menders,2026-04-11,Flat tyre',
        'kestle-4,Kestle Network,GBR,Lamp,Lamp,15,,,,Unknown,,kestle-menders,2026-04-11,',
      ].join('\n'),
    );
    expect(r.kind).toBe('ords-0.3');
    expect(r.refused).toEqual([]);
    expect(
      r.records.map((x) => [x.recordId, x.status, x.barrier, x.ordsCategory, x.ordsCategoryId, x.powered]),
    ).toEqual([
      ['kestle-1', 'fixed', null, 'Kettle', 14, true],
      ['kestle-2', 'end-of-life', 'spare-parts-not-available', 'Portable radio', 23, true],
      ['kestle-3', 'repairable', null, 'Unpowered - Bicycle', null, false],
      ['kestle-4', 'unknown', null, 'Lamp', 15, true],
    ]);
    expect(r.records[0]).toMatchObject({ brand: 'Brewmatic', yearOfManufacture: 2019, ageYears: 7, country: 'GBR' });
  });

  it('tells v0.2 (no product_category_id) from v0.3, and a plain sheet from both', () => {
    expect(fileKind(V03.split(','))).toBe('ords-0.3');
    expect(fileKind(V03.split(',').filter((c) => c !== 'product_category_id'))).toBe('ords-0.2');
    expect(fileKind(['Date', 'What', 'Result'])).toBe('plain');
  });

  it('accepts the table schema’s spelling "Too worn out" beside the standard’s "Item too worn out"', () => {
    // Source: REFERENCE.md §5 — the 2025-07 table schema spells barrier 6 "Too worn out"; accept both on import.
    const row = (id: string, b: string) => `${id},P,,,Toy,32,,,,End of life,${b},g,2026-01-10,`;
    const r = read([V03, row('a-1', 'Too worn out'), row('a-2', 'Item too worn out')].join('\n'));
    expect(r.records.map((x) => x.barrier)).toEqual(['too-worn-out', 'too-worn-out']);
  });

  it('refuses bad rows by row number, field and reason, and keeps the good ones', () => {
    const r = read(
      [
        V03,
        'a-1,P,,,Kettle,14,,,,Mended,,g,2026-01-10,',
        'a-2,P,,,Kettle,14,,,,Fixed,,g,2026-02-30,',
        'a-3,P,,,Kettle,14,,,,Fixed,,g,2027-01-01,',
        'a-4,P,,,Spaceship,,,,,Fixed,,g,2026-01-10,',
        'a-5,P,,,Kettle,14,,,,Fixed,,g,2026-01-10,',
        'a-5,P,,,Kettle,14,,,,Fixed,,g,2026-01-10,',
        'a-6,P,,,Kettle,14,,,,End of life,Gremlins,g,2026-01-10,',
        ',P,,,Kettle,14,,,,Fixed,,g,2026-01-10,',
      ].join('\n'),
    );
    expect(r.total).toBe(8);
    expect(r.records.map((x) => x.recordId)).toEqual(['a-5']);
    expect(r.refused.map((x) => [x.row, x.field])).toEqual([
      [2, 'repair_status'],
      [3, 'event_date'],
      [4, 'event_date'],
      [5, 'product_category'],
      [7, 'id'],
      [8, 'repair_barrier_if_end_of_life'],
      [9, 'id'],
    ]);
    expect(r.refused[1].message).toMatch(/2026-02-30.*not a date/);
    expect(r.refused[2].message).toMatch(/future/);
  });

  it('reads a byte-order mark, semicolons and a Windows-1252 file with accents', () => {
    const text = `\uFEFF${V03.replaceAll(',', ';')}\na-1;P;FRA;Bouilloire;Kettle;14;Élan;;;Fixed;;g;2026-01-10;Ne chauffe plus`;
    const r = read(text);
    expect(r.delimiter).toBe(';');
    expect(r.records[0]).toMatchObject({ recordId: 'a-1', brand: 'Élan', partnerCategory: 'Bouilloire' });
    // Source: WHATWG Encoding Standard, index windows-1252: byte 0xE9 is U+00E9 (é), 0xC9 is U+00C9 (É).
    const bytes = Uint8Array.from([...Buffer.from('brand\n', 'latin1'), 0xc9, 0x6c, 0x61, 0x6e, 0x0a]);
    expect(decodeCsv(bytes)).toEqual({ text: 'brand\nÉlan\n', encoding: 'windows-1252' });
    expect(decodeCsv(new TextEncoder().encode('brand\nÉlan\n')).encoding).toBe('utf-8');
  });

  it('says clearly what is wrong with a file that is no CSV, is empty, or lacks a column', () => {
    expect(() => decodeCsv(Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0, 0, 0]))).toThrow(UnreadableFile);
    expect(() => read(V03)).toThrow(/no records/);
    expect(() => read('id,event_date\na-1,2026-01-01')).toThrow(/Match a column/);
    expect(() => read('id,repair_status\na-1,Fixed')).toThrow(/Match a column to each of: event_date/);
    expect(() => read('"unclosed,quote\nx')).toThrow(UnreadableFile);
  });

  it('reads a plain spreadsheet through the columns an organiser matched, and previews its first rows', () => {
    const sheet =
      'Ref,Date,Item,Result,Notes\n17,2025-11-08,Toaster,Fixed,Crumb tray stuck\n18,2025-11-08,Jacket,Unknown,';
    expect(preview(sheet, 1)).toEqual({
      delimiter: ',',
      header: ['Ref', 'Date', 'Item', 'Result', 'Notes'],
      rows: [['17', '2025-11-08', 'Toaster', 'Fixed', 'Crumb tray stuck']],
    });
    const r = readRecords(sheet, {
      today,
      defaultProvider: 'Orrin Vale Fixing Circle',
      mapping: { id: 'Ref', event_date: 'Date', product_category: 'Item', repair_status: 'Result', problem: 'Notes' },
    });
    expect(r.kind).toBe('plain');
    expect(r.refused).toEqual([]);
    expect(r.records.map((x) => [x.provider, x.recordId, x.partnerCategory, x.status, x.problem])).toEqual([
      ['Orrin Vale Fixing Circle', '17', 'Toaster', 'fixed', 'Crumb tray stuck'],
      ['Orrin Vale Fixing Circle', '18', 'Jacket', 'unknown', ''],
    ]);
  });
});
