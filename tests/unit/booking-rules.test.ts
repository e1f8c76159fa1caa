import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CATEGORY_SEEDS } from '../../shared/categories/seeds';
import {
  formatReference,
  normaliseReference,
  REFERENCE_ALPHABET,
  REFERENCE_PATTERN,
} from '../../shared/booking/reference';
import { screenItem } from '../../shared/booking/screening';
import { freePlaces, generateSlots } from '../../shared/booking/slots';

describe('slots cut from opening hours', () => {
  const at = (h: number, m = 0) => new Date(Date.UTC(2027, 0, 16, h, m));
  it('cuts 10:00–13:00 into six 30-minute slots', () => {
    const s = generateSlots(at(10), at(13), 30, 4);
    expect(s.map((x) => x.startsAt.toISOString().slice(11, 16))).toEqual([
      '10:00',
      '10:30',
      '11:00',
      '11:30',
      '12:00',
      '12:30',
    ]);
    expect(s.at(-1)!.endsAt).toEqual(at(13));
  });
  it('leaves out a remainder shorter than a slot rather than running past closing time', () => {
    const s = generateSlots(at(10), at(11, 50), 20, 2);
    expect(s).toHaveLength(5);
    expect(s.at(-1)!.endsAt).toEqual(at(11, 40));
  });
  it('refuses an end before the start, a zero slot length and a negative capacity', () => {
    expect(() => generateSlots(at(13), at(10), 30, 4)).toThrow(/end after it starts/);
    expect(() => generateSlots(at(10), at(13), 0, 4)).toThrow(/above zero/);
    expect(() => generateSlots(at(10), at(13), 30, -1)).toThrow(/negative/);
  });
  it('never overlaps, never leaves a gap and never passes closing time (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 600 }),
        fc.integer({ min: 5, max: 120 }),
        fc.integer({ min: 0, max: 20 }),
        (minutes, len, cap) => {
          const start = at(9);
          const end = new Date(start.getTime() + minutes * 60_000);
          if (minutes === 0) {
            expect(() => generateSlots(start, end, len, cap)).toThrow(RangeError);
            return;
          }
          if (Math.floor(minutes / len) > 96) return;
          const s = generateSlots(start, end, len, cap);
          expect(s).toHaveLength(Math.floor(minutes / len));
          s.forEach((x, i) => {
            expect(x.endsAt.getTime() - x.startsAt.getTime()).toBe(len * 60_000);
            if (i) expect(x.startsAt).toEqual(s[i - 1].endsAt);
            expect(x.endsAt.getTime()).toBeLessThanOrEqual(end.getTime());
          });
        },
      ),
    );
  });
  it('counts places held for the waiting list as taken', () => {
    expect(freePlaces({ capacity: 5, booked: 3, held: 1 })).toBe(1);
    expect(freePlaces({ capacity: 5, booked: 5, held: 1 })).toBe(0);
  });
});

describe('booking references', () => {
  it('use no 0, O, 1 or I, and have 32 symbols', () => {
    expect(REFERENCE_ALPHABET).toHaveLength(32);
    expect(REFERENCE_ALPHABET).not.toMatch(/[01OI]/);
    expect(new Set(REFERENCE_ALPHABET).size).toBe(32);
  });
  it('always read as three symbols, a hyphen and three symbols (property)', () => {
    fc.assert(
      fc.property(fc.uint8Array({ minLength: 6, maxLength: 6 }), (bytes) => {
        const ref = formatReference(bytes);
        expect(ref).toMatch(REFERENCE_PATTERN);
        expect(normaliseReference(ref.toLowerCase().replace('-', ' '))).toBe(ref);
      }),
    );
  });
  it('reject what cannot be a reference', () => {
    expect(normaliseReference('7KQ-2MD')).toBe('7KQ-2MD');
    expect(normaliseReference('7kq2md')).toBe('7KQ-2MD');
    expect(normaliseReference('7KQ-2M0')).toBeNull();
    expect(normaliseReference('7KQ-2MDX')).toBeNull();
  });
});

describe('what a group takes', () => {
  const microwave = {
    id: 1,
    name: 'Microwave oven',
    refusal: { reason: 'High-voltage capacitor.', suggestion: 'Ask a trained repairer.' },
  };
  const lamp = { id: 2, name: 'Lamp' };
  it('refuses an excluded category with its own reason and suggestion', () => {
    expect(screenItem(microwave, [], { name: 'G', excludedCategoryIds: [1] })).toEqual({
      ok: false,
      code: 'category',
      categoryId: 1,
      reason: 'High-voltage capacitor.',
      suggestion: 'Ask a trained repairer.',
    });
  });
  it('takes a category the group has chosen to take, even one common practice refuses', () => {
    expect(screenItem(microwave, [], { name: 'G', excludedCategoryIds: [] })).toEqual({ ok: true });
  });
  it('refuses a damaged mains cable in any category', () => {
    const r = screenItem(lamp, ['damaged-cable'], { name: 'G', excludedCategoryIds: [] });
    expect(r).toEqual({ ok: false, code: 'hazard', hazard: 'damaged-cable' });
  });
  it('names the group and the kind when the kind has no refusal of its own', () => {
    expect(screenItem(lamp, [], { name: 'G', excludedCategoryIds: [2] })).toEqual({
      ok: false,
      code: 'not-taken',
      categoryId: 2,
      group: 'G',
      category: 'Lamp',
    });
  });
});

describe('the seeded taxonomy', () => {
  it('has at least 25 categories across appliances, IT, audio, lamps, tools, toys, textiles, bikes and furniture', () => {
    expect(CATEGORY_SEEDS.length).toBeGreaterThanOrEqual(25);
    const skills = new Set(CATEGORY_SEEDS.map((c) => c.skill));
    for (const s of ['electrical', 'electronics', 'computers', 'phones', 'textiles', 'bikes', 'woodwork', 'toys'])
      expect(skills).toContain(s);
    expect(new Set(CATEGORY_SEEDS.map((c) => c.slug)).size).toBe(CATEGORY_SEEDS.length);
  });
  it('uses the Statistics Netherlands UNU-KEY weights (2020) for the keys listed in the reference table', () => {
    // Source: Statistics Netherlands open e-waste dataset, table of UNU-KEY average weights, 2020.
    const table: Record<string, number> = {
      '0104': 72.54,
      '0108': 40.79,
      '0114': 22.9,
      '0201': 0.99,
      '0202': 3.27,
      '0203': 1.89,
      '0204': 5.88,
      '0205': 0.55,
      '0301': 0.4,
      '0302': 8.77,
      '0303': 0.85,
      '0304': 10.32,
      '0306': 0.09,
      '0309': 5.5,
      '0403': 3.73,
      '0404': 3.51,
      '0405': 2.14,
      '0408': 10.2,
      '0505': 0.08,
      '0506': 0.45,
      '0601': 2.49,
      '0701': 0.45,
      '0702': 0.48,
    };
    const keyed = CATEGORY_SEEDS.filter((c) => c.unuKey);
    expect(keyed.length).toBeGreaterThan(20);
    for (const c of keyed) expect([c.slug, c.avgWeightKg]).toEqual([c.slug, table[c.unuKey!]]);
  });
  it('files items in the WEEE Directive 2012/19/EU Annex III categories of the reference test cases', () => {
    // Reference test cases: laptop → 2, microwave → 5, smartphone → 6, kettle → 5, LED lamp → 3, fridge → 1.
    const cat = (slug: string) => CATEGORY_SEEDS.find((c) => c.slug === slug)!.weeeCategory;
    expect([
      cat('laptop'),
      cat('microwave'),
      cat('phone'),
      cat('kettle'),
      cat('led-lamp'),
      cat('fridge'),
      cat('desktop-pc'),
    ]).toEqual([2, 5, 6, 5, 3, 1, 6]);
    expect(cat('bicycle')).toBeNull();
  });
  it('refuses by default what common practice refuses: microwave ovens, refrigerant circuits, gas', () => {
    expect(
      CATEGORY_SEEDS.filter((c) => c.refusal)
        .map((c) => c.slug)
        .sort(),
    ).toEqual(['fridge', 'gas-appliance', 'microwave']);
  });
});

describe('the item label', () => {
  it('names the kind, then brand and model after a dash, and leaves out what is missing', async () => {
    const { itemLabel } = await import('../../shared/item-label');
    expect(itemLabel({ categoryName: 'Kettle', brand: 'Brava', model: 'K200' })).toBe('Kettle — Brava K200');
    expect(itemLabel({ categoryName: 'Kettle', brand: null, model: 'K200' })).toBe('Kettle — K200');
    expect(itemLabel({ categoryName: 'Kettle', brand: '  ', model: undefined })).toBe('Kettle');
  });
});
