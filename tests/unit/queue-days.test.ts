import { describe, expect, it } from 'vitest';
import { nextQueued, queueDays } from '../../shared/event-day/queue-days';

const london = 'Europe/London';
const item = (id: number, slotStartsAt: string, timeZone = london) => ({ id, slotStartsAt, timeZone });

describe('the fixer’s queue by day', () => {
  // "Now" is Friday 4 December 2026, 08:30 in London (GMT, UTC+0 in winter: IANA tz database, Europe/London).
  const now = new Date('2026-12-04T08:30:00Z');

  it('puts today first, then the coming days in order, then past days apart, most recent first', () => {
    const days = queueDays(
      [
        item(1, '2026-11-12T10:00:00Z'),
        item(2, '2026-10-08T10:00:00Z'),
        item(3, '2026-12-04T09:00:00Z'),
        item(4, '2026-12-04T10:30:00Z'),
        item(5, '2026-12-12T10:00:00Z'),
        item(6, '2027-01-09T10:00:00Z'),
        item(7, '2026-12-12T11:00:00Z'),
      ],
      now,
    );
    expect(days.map((d) => [d.kind, d.date, d.items.map((i) => i.id)])).toEqual([
      ['today', '2026-12-04', [3, 4]],
      ['upcoming', '2026-12-12', [5, 7]],
      ['upcoming', '2027-01-09', [6]],
      ['past', '2026-11-12', [1]],
      ['past', '2026-10-08', [2]],
    ]);
  });

  it('names each day as people say it, with the year only when it is not this year', () => {
    const days = queueDays([item(1, '2026-12-12T10:00:00Z'), item(2, '2027-01-09T10:00:00Z')], now);
    // Weekdays from the Gregorian calendar (timeanddate.com, calendar for 2026 and 2027, United Kingdom):
    // 12 December 2026 is a Saturday, 9 January 2027 a Saturday.
    expect(days.map((d) => d.label)).toEqual(['Saturday 12 December', 'Saturday 9 January 2027']);
  });

  it('reads the day in the group’s time zone, not in UTC', () => {
    // 23:30 UTC on 11 December is 00:30 on 12 December in Berlin (CET, UTC+1: IANA tz database, Europe/Berlin)
    // and 18:30 on 11 December in New York (EST, UTC−5: IANA tz database, America/New_York).
    const berlin = queueDays([item(1, '2026-12-11T23:30:00Z', 'Europe/Berlin')], now);
    expect([berlin[0].date, berlin[0].label]).toEqual(['2026-12-12', 'Saturday 12 December']);
    const newYork = queueDays([item(1, '2026-12-11T23:30:00Z', 'America/New_York')], now);
    expect([newYork[0].date, newYork[0].label]).toEqual(['2026-12-11', 'Friday 11 December']);
    // Just after midnight in Auckland (NZDT, UTC+13: IANA tz database, Pacific/Auckland) it is already 5 December,
    // so an item at 10:00 on 4 December there is a past day.
    const auckland = queueDays([item(1, '2026-12-03T21:00:00Z', 'Pacific/Auckland')], new Date('2026-12-04T11:30:00Z'));
    expect(auckland[0].kind).toBe('past');
  });

  it('gives the next item from today or later, never one left from a past day', () => {
    const items = [item(1, '2026-11-12T10:00:00Z'), item(2, '2026-12-12T10:00:00Z'), item(3, '2026-12-04T11:00:00Z')];
    expect(nextQueued(items, now)?.id).toBe(3);
    expect(nextQueued([items[0], items[1]], now)?.id).toBe(2);
    expect(nextQueued([items[0]], now)).toBeUndefined();
    expect(queueDays([], now)).toEqual([]);
  });

  it("names the day in the reader's language, with the language's own order and marks", () => {
    // CLDR (as in Node's ICU): German writes "Samstag, 12. Dezember", French and Dutch the weekday in lower case.
    const at = [item(1, '2026-12-12T10:00:00Z', 'Europe/Berlin')];
    expect(queueDays(at, now, 'de')[0].label).toBe('Samstag, 12. Dezember');
    expect(queueDays(at, now, 'fr')[0].label).toBe('samedi 12 décembre');
    expect(queueDays(at, now, 'nl')[0].label).toBe('zaterdag 12 december');
    expect(queueDays(at, now, 'en')[0].label).toBe('Saturday 12 December');
    // Next year's day carries its year.
    expect(queueDays([item(1, '2027-01-09T10:00:00Z', 'Europe/Berlin')], now, 'de')[0].label).toBe(
      'Samstag, 9. Januar 2027',
    );
  });
});
