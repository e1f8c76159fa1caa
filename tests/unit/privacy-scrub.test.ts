import { describe, expect, it } from 'vitest';
import { retentionCutoff, scrubPersonalData } from '../../shared/privacy/scrub';

describe('scrubPersonalData', () => {
  it('takes out addresses, phone numbers and the given names, and keeps what is said about the thing', () => {
    // 07700 900xxx and 020 7946 0xxx are ranges Ofcom keeps for drama (never a real line).
    expect(
      scrubPersonalData('Kettle trips the fuse. Ring Jo Marsh on 07700 900123 or (020) 7946-0001, jo@example.net', [
        'Jo Marsh',
      ]),
    ).toBe('Kettle trips the fuse. Ring [name] on [number] or [number], [e-mail]');
  });
  it('matches a part of the name on its own, but not inside another word', () => {
    expect(scrubPersonalData('Ask for Harriet. Harrietsham plug.', ['Harriet Vane'])).toBe(
      'Ask for [name]. Harrietsham plug.',
    );
  });
  it('leaves model numbers and short figures alone', () => {
    expect(scrubPersonalData('Model KX-2200, 240 V, 3 A fuse, bought 2019')).toBe(
      'Model KX-2200, 240 V, 3 A fuse, bought 2019',
    );
  });
});

describe('retentionCutoff', () => {
  it('counts calendar months back, the last day of a shorter month when the day is missing', () => {
    // date-fns documentation of subMonths: subMonths(new Date(2015, 1, 1), 5) is 1 September 2014.
    expect(retentionCutoff(new Date(Date.UTC(2015, 1, 1, 12)), 5).toISOString()).toBe('2014-09-01T12:00:00.000Z');
    // ECMAScript Date has no 31 February; date-fns clamps 31 March minus one month to 28 February (non-leap 2026).
    expect(retentionCutoff(new Date(Date.UTC(2026, 2, 31, 12)), 1).toISOString()).toBe('2026-02-28T12:00:00.000Z');
  });
});
