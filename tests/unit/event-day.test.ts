import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { canMoveTo, ITEM_STATUSES } from '../../shared/event-day/constants';
import { fits, LABEL_LAYOUTS, layoutById, paginate, A4 } from '../../shared/event-day/label-sheets';
import { estimateWaits, liveWarnings, queueOrder } from '../../shared/event-day/queue';
import {
  formatTagCode,
  normaliseTagCode,
  readScan,
  shortName,
  TAG_CODE_PATTERN,
} from '../../shared/event-day/tag-code';
import { outcomeSchema, safetyCheckSchema } from '../../shared/schemas/event-day';

describe('tag codes', () => {
  it('never use 0, O, 1 or I, and read back whatever the case or spacing', () => {
    fc.assert(
      fc.property(fc.uint8Array({ minLength: 5, maxLength: 5 }), (bytes) => {
        const code = formatTagCode(bytes);
        expect(code).toMatch(TAG_CODE_PATTERN);
        expect(code).not.toMatch(/[01OI]/);
        expect(normaliseTagCode(` ${code.slice(0, 2).toLowerCase()} ${code.slice(2)} `)).toBe(code);
      }),
    );
    expect(normaliseTagCode('K0M4Q')).toBeNull();
  });

  it('reads a scanned booking QR, a scanned tag and typed text apart', () => {
    expect(readScan('http://localhost:3000/b/K7M-2QD')).toEqual({ kind: 'booking', reference: 'K7M-2QD' });
    expect(readScan('https://mendery.example/t/KD2A7')).toEqual({ kind: 'tag', code: 'KD2A7' });
    expect(readScan('k7m2qd')).toEqual({ kind: 'booking', reference: 'K7M-2QD' });
    expect(readScan('kd2a7')).toEqual({ kind: 'tag', code: 'KD2A7' });
    expect(readScan('https://elsewhere.example/t/K7M-2QD')).toBeNull();
    expect(readScan('Orla')).toBeNull();
  });

  it('shows a first name and an initial only', () => {
    expect(shortName('Orla Whitcombe')).toBe('Orla W.');
    expect(shortName('  Bea  van der Lindqvist ')).toBe('Bea L.');
    expect(shortName('Cher')).toBe('Cher');
  });
});

describe('the item lifecycle', () => {
  it('goes booked → checked in → waiting → at the bench → done, with no-show and withdrawn on the side', () => {
    expect(
      canMoveTo('booked', 'checked-in') &&
        canMoveTo('checked-in', 'waiting') &&
        canMoveTo('waiting', 'at-bench') &&
        canMoveTo('at-bench', 'done'),
    ).toBe(true);
    expect(canMoveTo('booked', 'done')).toBe(false);
    expect(canMoveTo('booked', 'at-bench')).toBe(false);
    expect(canMoveTo('done', 'no-show')).toBe(false);
    expect(canMoveTo('no-show', 'checked-in')).toBe(true);
    for (const s of ITEM_STATUSES) expect(canMoveTo(s, 'booked')).toBe(false);
  });

  it('asks for a barrier exactly for end of life, and for the part when one is needed', () => {
    expect(outcomeSchema.safeParse({ outcome: 'end-of-life' }).success).toBe(false);
    expect(outcomeSchema.safeParse({ outcome: 'end-of-life', barrier: 'lack-of-equipment' }).success).toBe(true);
    expect(outcomeSchema.safeParse({ outcome: 'fixed', barrier: 'lack-of-equipment' }).success).toBe(false);
    expect(outcomeSchema.safeParse({ outcome: 'parts-needed' }).success).toBe(false);
    expect(
      outcomeSchema.safeParse({ outcome: 'parts-needed', part: { description: 'Fuse 13 A', cost: '' } }).success,
    ).toBe(true);
    const visual = { cord: true, plug: true, strainRelief: true, casing: true, noHeatDamage: true };
    expect(safetyCheckSchema.safeParse({ visual, applianceClass: 'II', insulationMOhm: 4 }).success).toBe(true);
    expect(safetyCheckSchema.safeParse({ visual, applianceClass: 'I', insulationMOhm: 4 }).success).toBe(false);
    expect(safetyCheckSchema.safeParse({ visual, applianceClass: 'III' }).success).toBe(true);
  });
});

describe('queue order and estimated waits (worked by hand)', () => {
  const t = (min: number) => Date.UTC(2026, 11, 5, 10, min);
  it('serves booked items of a slot before its walk-ins, then by check-in time, slot by slot', () => {
    const items = [
      { id: 1, slotStartsAt: t(0), walkIn: true, checkedInAt: t(1), minutes: 20 },
      { id: 2, slotStartsAt: t(0), walkIn: false, checkedInAt: t(5), minutes: 20 },
      { id: 3, slotStartsAt: t(30), walkIn: false, checkedInAt: t(0), minutes: 20 },
      { id: 4, slotStartsAt: t(0), walkIn: false, checkedInAt: t(2), minutes: 20 },
    ];
    expect(queueOrder(items).map((i) => i.id)).toEqual([4, 2, 1, 3]);
  });

  it('gives each item to its planned fixer or whoever is free first, each for its minutes', () => {
    // Two fixers: A busy until 10:20, B free now (10:00). Items in order: x (30 min, for A), y (20), z (20), w (10).
    // x waits for A: 20 min; y goes to B now: 0; z goes to B at 10:20 (A is busy with x until 10:50): 20;
    // w goes to B at 10:40: 40.
    const now = t(0);
    const waits = estimateWaits(
      now,
      [
        { id: 100, busyUntil: t(20) },
        { id: 200, busyUntil: t(-5) },
      ],
      [
        { id: 1, slotStartsAt: t(0), walkIn: false, checkedInAt: t(-10), fixerId: 100, minutes: 30 },
        { id: 2, slotStartsAt: t(0), walkIn: false, checkedInAt: t(-9), minutes: 20 },
        { id: 3, slotStartsAt: t(0), walkIn: false, checkedInAt: t(-8), minutes: 20 },
        { id: 4, slotStartsAt: t(0), walkIn: false, checkedInAt: t(-7), minutes: 10 },
      ],
    );
    expect([...waits.entries()]).toEqual([
      [1, 20],
      [2, 0],
      [3, 20],
      [4, 40],
    ]);
    expect(
      estimateWaits(now, [], [{ id: 9, slotStartsAt: t(0), walkIn: false, checkedInAt: t(0), minutes: 5 }]).get(9),
    ).toBeNull();
  });

  it('never promises an earlier start to an item further back in a one-fixer queue', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 5, max: 60 }), { minLength: 1, maxLength: 30 }),
        fc.integer({ min: 0, max: 60 }),
        (minutes, busy) => {
          const items = minutes.map((m, i) => ({
            id: i + 1,
            slotStartsAt: 0,
            walkIn: false,
            checkedInAt: i,
            minutes: m,
          }));
          const waits = estimateWaits(0, [{ id: 1, busyUntil: busy * 60_000 }], items);
          const list = items.map((i) => waits.get(i.id)!);
          for (let i = 1; i < list.length; i++) expect(list[i]).toBe(list[i - 1] + minutes[i - 1]);
          expect(list[0]).toBe(busy);
        },
      ),
    );
  });

  it('warns about an item waiting over 45 minutes and a fixer with nothing in hand while items wait', () => {
    const now = t(60);
    const w = liveWarnings(
      now,
      [
        { id: 1, checkedInAt: t(10), label: 'No. 3' },
        { id: 2, checkedInAt: t(20), label: 'No. 4' },
      ],
      [
        { userId: 7, name: 'Idris', busy: false },
        { userId: 8, name: 'Wren', busy: true },
      ],
    );
    expect(w.map((x) => x.kind)).toEqual(['long-wait', 'idle-fixer']);
    expect(w[0].message).toContain('50 minutes');
    expect(liveWarnings(now, [], [{ userId: 7, name: 'Idris', busy: false }])).toEqual([]);
  });
});

describe('label stock for intake tags (sizes as printed on the packs, from memory)', () => {
  it('fits every offered layout on its page', () => {
    for (const l of LABEL_LAYOUTS) {
      expect(fits(l)).toBe(true);
      expect(l.left).toBeGreaterThanOrEqual(0);
      expect(l.top).toBeGreaterThanOrEqual(0);
    }
    expect(layoutById('a4-24')).toMatchObject({ columns: 3, rows: 8, label: { width: 63.5, height: 33.9 } });
  });

  it('shows why 24 labels of 63.5 × 38.1 mm cannot be one A4 sheet: 8 rows are 304.8 mm, the page 297 mm', () => {
    expect(8 * 38.1).toBeCloseTo(304.8, 6);
    expect(fits({ page: A4, label: { width: 63.5, height: 38.1 }, columns: 3, rows: 8, gapX: 2.5, gapY: 0 })).toBe(
      false,
    );
    expect(fits({ page: A4, label: { width: 63.5, height: 38.1 }, columns: 3, rows: 7, gapX: 2.5, gapY: 0 })).toBe(
      true,
    );
  });

  it('fills pages in order and skips labels already used on a part-used sheet', () => {
    const l = layoutById('a4-24');
    const pages = paginate(
      Array.from({ length: 30 }, (_, i) => i),
      l,
      4,
    );
    expect(pages).toHaveLength(2);
    expect(pages[0].slice(0, 5)).toEqual([null, null, null, null, 0]);
    expect(pages[1]).toHaveLength(34 - 24);
    expect(paginate([], l)).toEqual([]);
  });
});
