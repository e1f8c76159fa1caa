import { describe, expect, it } from 'vitest';
import { localDate, sessionWhen, splitSessions } from '../../shared/sessions';

const at = (iso: string) => new Date(iso);
const session = (startsAt: string, hours: number, timeZone = 'Europe/London') => ({
  startsAt,
  endsAt: new Date(at(startsAt).getTime() + hours * 3600_000).toISOString(),
  timeZone,
});

/*
 * Offsets from the IANA time zone database (tzdata, "europe" and "australasia" files):
 * Europe/London is UTC+0 in winter and UTC+1 (BST) from the last Sunday of March to the last Sunday of October;
 * Pacific/Auckland is UTC+13 (NZDT) from the last Sunday of September to the first Sunday of April.
 */
describe('sessionWhen: today, upcoming or past, on the group’s own calendar', () => {
  it('reads a London date in summer an hour ahead of UTC', () => {
    // 23:30 UTC on 4 July 2026 is 00:30 BST on 5 July (IANA tzdata: Europe/London UTC+1 in July).
    expect(localDate(at('2026-07-04T23:30:00Z'), 'Europe/London')).toBe('2026-07-05');
    expect(localDate(at('2026-12-04T23:30:00Z'), 'Europe/London')).toBe('2026-12-04');
  });

  it('counts a session as today all day in London, even after it ended', () => {
    const s = session('2026-12-04T10:00:00Z', 3); // 10:00–13:00 GMT (IANA tzdata: London UTC+0 in December)
    expect(sessionWhen(s, at('2026-12-04T08:00:00Z'), 'Europe/London')).toBe('today');
    expect(sessionWhen(s, at('2026-12-04T23:30:00Z'), 'Europe/London')).toBe('today');
    expect(sessionWhen(s, at('2026-12-05T00:00:00Z'), 'Europe/London')).toBe('past');
  });

  it('moves a London session to the past at London’s midnight, not UTC’s', () => {
    // 10:00–13:00 BST on 4 July is 09:00–12:00 UTC; at 23:30 UTC it is already 5 July in London (IANA tzdata).
    const s = session('2026-07-04T09:00:00Z', 3);
    expect(sessionWhen(s, at('2026-07-04T22:30:00Z'), 'Europe/London')).toBe('today');
    expect(sessionWhen(s, at('2026-07-04T23:30:00Z'), 'Europe/London')).toBe('past');
    // The same instants read in UTC would still call it today: the group's zone is what decides.
    expect(sessionWhen(s, at('2026-07-04T23:30:00Z'), 'UTC')).toBe('today');
    // The next morning's session is today in London while UTC still calls it upcoming.
    const next = session('2026-07-05T09:00:00Z', 3);
    expect(sessionWhen(next, at('2026-07-04T23:30:00Z'), 'Europe/London')).toBe('today');
    expect(sessionWhen(next, at('2026-07-04T23:30:00Z'), 'UTC')).toBe('upcoming');
  });

  it('reads Auckland thirteen hours ahead in December', () => {
    // 22:00–23:00 NZDT on 4 December is 09:00–10:00 UTC; 12:00 UTC is 01:00 on 5 December in Auckland (IANA tzdata).
    const s = session('2026-12-04T09:00:00Z', 1, 'Pacific/Auckland');
    expect(sessionWhen(s, at('2026-12-04T10:30:00Z'), 'Pacific/Auckland')).toBe('today');
    expect(sessionWhen(s, at('2026-12-04T12:00:00Z'), 'Pacific/Auckland')).toBe('past');
  });

  it('keeps a session that runs past midnight as today while it runs', () => {
    // 22:00 GMT on 4 December to 01:00 GMT on 5 December (IANA tzdata: London UTC+0 in December).
    const s = session('2026-12-04T22:00:00Z', 3);
    expect(sessionWhen(s, at('2026-12-04T21:00:00Z'), 'Europe/London')).toBe('today');
    expect(sessionWhen(s, at('2026-12-05T00:30:00Z'), 'Europe/London')).toBe('today');
    expect(sessionWhen(s, at('2026-12-05T01:00:00Z'), 'Europe/London')).toBe('past');
  });

  it('calls a later date upcoming', () => {
    const s = session('2026-12-05T10:00:00Z', 3);
    expect(sessionWhen(s, at('2026-12-04T23:59:00Z'), 'Europe/London')).toBe('upcoming');
  });
});

describe('splitSessions: the organiser’s two lists', () => {
  it('puts today first then the soonest, and the past most recent first', () => {
    const now = at('2026-12-04T12:00:00Z');
    const list = [
      { id: 1, ...session('2026-11-07T10:00:00Z', 3) },
      { id: 2, ...session('2027-01-09T10:00:00Z', 3) },
      { id: 3, ...session('2026-12-04T10:00:00Z', 3) },
      { id: 4, ...session('2026-10-03T10:00:00Z', 3) },
      { id: 5, ...session('2026-12-12T10:00:00Z', 3) },
      // Already 5 December in Auckland at 12:00 UTC, and this one ended at 10:00 UTC (IANA tzdata: UTC+13).
      { id: 6, ...session('2026-12-04T09:00:00Z', 1, 'Pacific/Auckland') },
    ];
    const { coming, past } = splitSessions(list, now);
    expect(coming.map((s) => [s.id, s.when])).toEqual([
      [3, 'today'],
      [5, 'upcoming'],
      [2, 'upcoming'],
    ]);
    expect(past.map((s) => s.id)).toEqual([6, 1, 4]);
  });

  it('gives two empty lists for no sessions', () => {
    expect(splitSessions([], new Date())).toEqual({ coming: [], past: [] });
  });
});
