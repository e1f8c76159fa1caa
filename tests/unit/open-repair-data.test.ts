import { describe, expect, it } from 'vitest';
import { BARRIER_CHOICES, BARRIER_LABELS, BARRIERS, OUTCOME_LABELS, OUTCOMES } from '../../shared/event-day/constants';
import {
  ORDS_BARRIER,
  ORDS_REPAIR_STATUS,
  ordsBarrierText,
  ordsStatusText,
} from '../../shared/impact/open-repair-data';

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
