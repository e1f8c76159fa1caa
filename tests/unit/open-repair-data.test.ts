import { describe, expect, it } from 'vitest';
import { BARRIER_CHOICES, BARRIER_LABELS, BARRIERS, OUTCOME_LABELS, OUTCOMES } from '../../shared/event-day/constants';
import {
  ORDS_BARRIER,
  ORDS_REPAIR_STATUS,
  ordsBarrierText,
  ordsStatusText,
} from '../../shared/impact/open-repair-data';
import { CATEGORY_SEEDS } from '../../shared/categories/seeds';
import {
  ORDS_CATEGORY_OF_SLUG,
  ORDS_PRODUCT_CATEGORIES,
  ordsCategoryId,
  ordsCategoryOf,
  UNPOWERED_KIND_OF_SLUG,
} from '../../shared/impact/ords-categories';

describe('the Open Repair Data file’s words', () => {
  it('maps each stored reason to the codelist’s code and text', () => {
    // Source: REFERENCE.md §5, ORDS v0.3 repair_barrier_if_end_of_life codelist (code, text).
    expect(BARRIERS.map((b) => [ORDS_BARRIER[b].code, ORDS_BARRIER[b].text])).toEqual([
      [1, 'Spare parts not available'],
      [2, 'Spare parts too expensive'],
      [3, 'No way to open product'],
      [4, 'Repair information not available'],
      [5, 'Lack of equipment'],
      [6, 'Item too worn out'],
    ]);
  });

  it('maps each outcome to the repair_status codelist', () => {
    // Source: REFERENCE.md §5, repair_status codelist: 0 Unknown, 1 Fixed, 2 Repairable, 3 End of life.
    expect(Object.values(ORDS_REPAIR_STATUS).map((s) => [s.code, s.text])).toEqual([
      [0, 'Unknown'],
      [1, 'Fixed'],
      [2, 'Repairable'],
      [3, 'End of life'],
    ]);
    expect(OUTCOMES.map((o) => ordsStatusText(o))).toEqual(['Fixed', 'Repairable', 'Repairable', 'End of life']);
    expect(ordsStatusText(null)).toBe('Unknown');
  });

  it('fills the barrier only for an item beyond mending', () => {
    // Source: REFERENCE.md §5, the barrier column is used only where the status is End of life.
    expect(ordsBarrierText('end-of-life', 'too-worn-out')).toBe('Item too worn out');
    expect(ordsBarrierText('fixed', 'too-worn-out')).toBe('');
    expect(ordsBarrierText('end-of-life', null)).toBe('');
  });

  it('shows Mendery’s own words and order on screen, never the codelist’s', () => {
    const codelist = Object.values(ORDS_BARRIER).map((b) => b.text.toLowerCase());
    for (const b of BARRIERS) expect(codelist).not.toContain(BARRIER_LABELS[b].toLowerCase());
    expect(OUTCOME_LABELS['end-of-life']).not.toMatch(/end of life/i);
    expect([...BARRIER_CHOICES].sort()).toEqual([...BARRIERS].sort());
    expect(BARRIER_CHOICES).not.toEqual(BARRIERS);
  });
});

describe('the Open Repair Data product categories', () => {
  it('numbers the codelist as the standard does', () => {
    // Source: REFERENCE.md §5, ORDS v0.3 product_category codelist (id, text).
    expect(ORDS_PRODUCT_CATEGORIES).toHaveLength(40);
    expect(
      (['Aircon/dehumidifier', 'Kettle', 'Laptop', 'Misc', 'Toy', 'Vacuum', 'Iron'] as const).map((t) => [
        t,
        ordsCategoryId(t),
      ]),
    ).toEqual([
      ['Aircon/dehumidifier', 1],
      ['Kettle', 14],
      ['Laptop', 16],
      ['Misc', 18],
      ['Toy', 32],
      ['Vacuum', 34],
      ['Iron', 40],
    ]);
  });

  it('gives every seeded electrical category a codelist entry of its own, and every other one an unpowered kind', () => {
    for (const c of CATEGORY_SEEDS) {
      const o = ordsCategoryOf(c);
      if (c.weeeCategory === null) {
        expect(o.powered, c.slug).toBe(false);
        // Source: REFERENCE.md §5, the 2025-07 open data writes unpowered categories "Unpowered - <kind>".
        expect(o.text, c.slug).toMatch(/^Unpowered - [A-Z][a-z]+$/);
        expect(UNPOWERED_KIND_OF_SLUG[c.slug], c.slug).toBeDefined();
      } else {
        expect(o.powered, c.slug).toBe(true);
        expect(ORDS_CATEGORY_OF_SLUG[c.slug], `${c.slug} has a mapping of its own`).toBeDefined();
      }
    }
    expect(ordsCategoryOf({ slug: 'kettle', weeeCategory: 5 })).toEqual({ powered: true, id: 14, text: 'Kettle' });
    expect(ordsCategoryOf({ slug: 'bicycle', weeeCategory: null })).toEqual({
      powered: false,
      text: 'Unpowered - Bicycle',
    });
    // An electrical category an admin added later has no mapping: it is counted as Misc (id 18), not dropped.
    expect(ordsCategoryOf({ slug: 'bread-maker', weeeCategory: 5 })).toEqual({ powered: true, id: 18, text: 'Misc' });
  });
});
