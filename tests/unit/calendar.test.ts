import { describe, expect, it } from 'vitest';
import { bookingEntry, shiftEntry, shiftRole, uidHost, venueLine } from '../../shared/calendar';

const venue = { name: 'Tanner’s Yard Hall', address: '14 Weaver Street', town: 'Kestlebridge' };
const now = new Date('2026-12-04T09:00:00Z');

describe('calendar entries', () => {
  it('writes the venue as one line and leaves out empty parts', () => {
    expect(venueLine(venue)).toBe('Tanner’s Yard Hall, 14 Weaver Street, Kestlebridge');
    expect(venueLine({ ...venue, address: '  ' })).toBe('Tanner’s Yard Hall, Kestlebridge');
  });

  it('makes UIDs of the form id@host, so two sites never share one (RFC 5545 §3.8.4.7 recommends a host part)', () => {
    const b = bookingEntry(
      {
        reference: 'AKK-AGD',
        eventTitle: 'Drop-in',
        groupName: 'Menders',
        slotStartsAt: now,
        slotEndsAt: now,
        venue,
        manageUrl: 'https://mendery.example/bookings/AKK-AGD?token=t',
        itemNames: [],
      },
      'https://mendery.example',
      now,
    );
    expect(b.uid).toBe('booking-AKK-AGD@mendery.example');
    expect(b.description).not.toContain('You are bringing');
    expect(uidHost('not a url')).toBe('mendery.local');
  });

  it('names a shift by the role it stands for, fixing first when a person holds several', () => {
    expect(shiftRole(['organiser', 'fixer'])).toBe('fixer');
    expect(shiftRole(['organiser', 'host'])).toBe('host');
    expect(shiftRole(['organiser'])).toBe('organiser');
    const base = {
      shiftId: 7,
      eventId: 3,
      eventTitle: 'Drop-in',
      groupName: 'Menders',
      startsAt: now,
      endsAt: now,
      venue,
      bench: 'Bench 2',
    };
    expect(shiftEntry({ ...base, role: 'fixer' }, 'https://m.example', now)).toMatchObject({
      uid: 'shift-7@m.example',
      summary: 'Fixing at Drop-in',
      url: 'https://m.example/events/3',
    });
    expect(shiftEntry({ ...base, role: 'host' }, 'https://m.example', now).summary).toBe('Reception at Drop-in');
    expect(shiftEntry({ ...base, role: 'organiser' }, 'https://m.example', now).description).toContain(
      'Your bench: Bench 2.',
    );
  });
});
