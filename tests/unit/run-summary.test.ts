import { describe, expect, it } from 'vitest';
import { summariseRun } from '../../shared/triage/run-summary';

// A one-slot round as server/src/features/triage/service.ts stores it (input of shared/triage/engine.ts).
const input = {
  items: [
    { id: '1', skill: 'toys', minLevel: 1, equipment: ['soldering-station'], priority: 0 },
    { id: '2', skill: 'textiles', minLevel: 1, equipment: [], priority: 1 },
  ],
  volunteers: [{ id: '7', name: 'Ada', skills: { textiles: 3, toys: 0 }, capacity: 1, benchId: '5' }],
  benches: [{ id: '5', name: 'Sewing table', equipment: ['sewing-machine'], seats: 2 }],
};
const result = {
  assignments: [{ itemId: '2', volunteerId: '7', benchId: '5' }],
  unassigned: [{ itemId: '1', reason: 'no-skill', detail: 'Nobody here has toys.' }],
};

describe('a triage run in words', () => {
  it('names who took which item where, and why the rest wait', () => {
    const s = summariseRun(input, result, new Map([['2', 'Clothing · B9N-3HF']]), 0)!;
    expect(s.scope).toBe('slot');
    expect(s.placed).toEqual([{ itemId: '2', item: 'Clothing · B9N-3HF', fixer: 'Ada', bench: 'Sewing table' }]);
    // An item with no label left (since deleted) keeps its number. A run stored before reasons kept their values
    // has them worked out again from its input, for the screen to word.
    expect(s.waiting).toEqual([
      {
        itemId: '1',
        item: 'Item 1',
        reason: 'No fixer with the skill',
        detail: 'Nobody here has toys.',
        why: { reason: 'no-skill', skill: 'toys', level: 1 },
      },
    ]);
    expect(s.fixers[0]).toMatchObject({ name: 'Ada', skills: 'Textiles (expert)', seat: 'Sewing table' });
    expect(s.items[0]).toMatchObject({ needs: 'Toys, learning or better', kit: 'Soldering station' });
    expect(s.rules.at(-1)).toBe('No placement was locked, so every item could move.');
  });
  it('says it cannot read a run stored in another form', () => {
    expect(summariseRun({ nothing: true }, result, new Map(), 0)).toBeNull();
  });
});
