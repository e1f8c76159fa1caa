import { describe, expect, it } from 'vitest';
import { skillFullMessage, slotBookability, slotHasPassed, type SlotState } from '../../shared/booking/bookability';

// The expected answers are worked by hand from the rules in the issue (a time that has passed is not offered; a
// kind's limit refuses the whole booking; a full time can be waited for), the way a booking desk counts places.
const at = (h: number, m = 0) => new Date(Date.UTC(2027, 0, 16, h, m));
const slot = (over: Partial<SlotState> = {}): SlotState => ({
  startsAt: at(10),
  endsAt: at(10, 30),
  capacity: 6,
  booked: 0,
  held: 0,
  skillLimits: { textiles: 2 },
  skillTaken: {},
  ...over,
});

describe('slot bookability for a given set of items', () => {
  it('offers a time with room and counts free places as capacity − booked − held', () => {
    expect(slotBookability(slot({ booked: 2, held: 1 }), ['electrical'], at(9))).toEqual({ ok: true, free: 3 });
  });

  it('refuses a time that has ended, and still books one under way (it ends at 10:30)', () => {
    expect(slotHasPassed(slot(), at(10, 30))).toBe(true);
    expect(slotHasPassed(slot(), at(10, 29))).toBe(false);
    const b = slotBookability(slot(), ['electrical'], at(11));
    expect(b).toMatchObject({ ok: false, reason: 'past', message: 'That time has already passed.' });
    expect(slotBookability(slot(), ['electrical'], at(10, 15)).ok).toBe(true);
  });

  it('reads ISO strings as the client gets them from JSON', () => {
    const s = slot({ startsAt: at(10).toISOString(), endsAt: at(10, 30).toISOString() });
    expect(slotBookability(s, [], at(11)).ok).toBe(false);
    expect(slotBookability(s, [], at(9)).ok).toBe(true);
  });

  it('says why a clothing item cannot take a time whose textile limit is reached, though places are free', () => {
    const b = slotBookability(slot({ booked: 2, skillTaken: { textiles: 2 } }), ['textiles'], at(9));
    expect(b).toMatchObject({ ok: false, reason: 'skill-full', skill: 'textiles', limit: 2, left: 0, wanted: 1 });
    if (b.ok || b.reason !== 'skill-full') throw new Error('expected skill-full');
    expect(b.short).toBe('Textile repairs are full at this time');
    // The same time still takes a kettle: the limit is per kind.
    expect(slotBookability(slot({ booked: 2, skillTaken: { textiles: 2 } }), ['electrical'], at(9)).ok).toBe(true);
  });

  it('refuses all items of a booking alike when two of a kind exceed what is left (1 left, 2 wanted)', () => {
    const b = slotBookability(
      slot({ booked: 1, skillTaken: { textiles: 1 } }),
      ['textiles', 'textiles', 'bikes'],
      at(9),
    );
    expect(b).toMatchObject({ ok: false, reason: 'skill-full', left: 1, wanted: 2 });
    if (b.ok || b.reason !== 'skill-full') throw new Error('expected skill-full');
    expect(b.short).toBe('Only 1 textile place left at this time');
    expect(b.message).toContain('the fixers can take 2 textiles items; only 1 is left and you are booking 2');
  });

  it('sends a booking that does not fit the places to the waiting list, and a kind over its limit is refused first', () => {
    const full = slotBookability(slot({ capacity: 3, booked: 2 }), ['electrical', 'electrical'], at(9));
    expect(full).toMatchObject({ ok: false, reason: 'full', free: 1, short: '1 free · wait' });
    const both = slot({ capacity: 2, booked: 2, skillTaken: { textiles: 2 } });
    expect(slotBookability(both, ['textiles'], at(9))).toMatchObject({ reason: 'skill-full' });
    expect(slotBookability(slot({ capacity: 2, booked: 2 }), [], at(9))).toMatchObject({ reason: 'full', free: 0 });
  });

  it('lets a return visit go one over the capacity and the kind’s limit', () => {
    const s = slot({ capacity: 2, booked: 2, skillTaken: { textiles: 2 } });
    expect(slotBookability(s, ['textiles'], at(9), { spare: 1 })).toEqual({ ok: true, free: 1 });
  });

  it('words the server’s refusal in the singular and plural', () => {
    expect(skillFullMessage('bikes', 1, 0, 1)).toBe(
      'At this time the fixers can take 1 bikes item; none is left and you are booking 1. Choose another time.',
    );
    expect(skillFullMessage('textiles', 3, 2, 3)).toContain(
      'only 2 are left and you are booking 3. Choose another time, or book fewer of them here.',
    );
  });
});
