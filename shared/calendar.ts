import type { GroupRole } from './constants';

/** One event of a calendar file, in Mendery's words; the server writes it as iCalendar. Times are instants (UTC). */
export interface CalendarEntry {
  /** Stable across downloads, so a calendar app updates the entry instead of adding a second one. */
  uid: string;
  start: Date;
  end: Date;
  summary: string;
  location: string;
  description: string;
  url: string;
  /** DTSTAMP: when the file was written, so an app that imports it again takes it as the newest word. */
  stamp: Date;
}

export interface CalendarVenue {
  name: string;
  address: string;
  town: string;
}

/** The venue as one line: name, address and town, empty parts left out. */
export const venueLine = (v: CalendarVenue) =>
  [v.name, v.address, v.town]
    .map((s) => s.trim())
    .filter(Boolean)
    .join(', ');

/** The host part of the UIDs: the public URL's host, so two Mendery sites never share a UID. */
export const uidHost = (publicUrl: string) => {
  try {
    return new URL(publicUrl).host || 'mendery.local';
  } catch {
    return 'mendery.local';
  }
};

export interface BookingFacts {
  reference: string;
  eventTitle: string;
  groupName: string;
  slotStartsAt: Date;
  slotEndsAt: Date;
  venue: CalendarVenue;
  manageUrl: string;
  itemNames: string[];
}

/** The words of a booking's calendar entry; the server passes the booking's language (locales/<language>/mail.json). */
export type CalendarWords = (
  key: 'summary' | 'reference' | 'bringing' | 'show' | 'page',
  values: Record<string, string>,
) => string;
const ENGLISH: CalendarWords = (key, v) =>
  ({
    summary: `Repair slot: ${v.session}`,
    reference: `Booking reference: ${v.reference}`,
    bringing: `You are bringing: ${v.items}.`,
    show: 'Show the reference or the QR code on your booking page at the reception desk.',
    page: `Your booking page (move or cancel): ${v.url}`,
  })[key];

/** A visitor's booked slot as a calendar entry: the slot's times, the venue, the reference and the booking page. */
export function bookingEntry(
  b: BookingFacts,
  publicUrl: string,
  now: Date,
  words: CalendarWords = ENGLISH,
): CalendarEntry {
  return {
    uid: `booking-${b.reference}@${uidHost(publicUrl)}`,
    start: b.slotStartsAt,
    end: b.slotEndsAt,
    summary: words('summary', { session: b.eventTitle }),
    location: venueLine(b.venue),
    description: [
      words('reference', { reference: b.reference }),
      `${b.groupName}.`,
      b.itemNames.length ? words('bringing', { items: b.itemNames.join('; ') }) : '',
      words('show', {}),
      words('page', { url: b.manageUrl }),
    ]
      .filter(Boolean)
      .join('\n'),
    url: b.manageUrl,
    stamp: now,
  };
}

/** The role a person's shift stands for in a group where they hold several: fixing first, then reception. */
export const shiftRole = (roles: GroupRole[]): GroupRole =>
  roles.includes('fixer') ? 'fixer' : roles.includes('host') ? 'host' : 'organiser';

/** The words of a volunteer's shift entries; the server passes the person's language (locales/<language>/mail.json). */
export type ShiftWords = (
  key: 'fixing' | 'reception' | 'organising' | 'bench' | 'page',
  values: Record<string, string>,
) => string;
const SHIFT_ENGLISH: ShiftWords = (key, v) =>
  ({
    fixing: `Fixing at ${v.session}`,
    reception: `Reception at ${v.session}`,
    organising: `Organising ${v.session}`,
    bench: `Your bench: ${v.bench}.`,
    page: `The session in Mendery: ${v.url}`,
  })[key];

/** What a volunteer does at a session, in the words of the volunteer's page. */
export const shiftSummary = (role: GroupRole, eventTitle: string, words: ShiftWords = SHIFT_ENGLISH) =>
  words(role === 'fixer' ? 'fixing' : role === 'host' ? 'reception' : 'organising', { session: eventTitle });

export interface ShiftFacts {
  shiftId: number;
  eventId: number;
  eventTitle: string;
  groupName: string;
  role: GroupRole;
  startsAt: Date;
  endsAt: Date;
  venue: CalendarVenue;
  bench: string | null;
}

/** A volunteer's shift as a calendar entry: the shift's hours (not the whole session's), the venue, the session's page. */
export function shiftEntry(
  s: ShiftFacts,
  publicUrl: string,
  now: Date,
  words: ShiftWords = SHIFT_ENGLISH,
): CalendarEntry {
  const url = `${publicUrl}/events/${s.eventId}`;
  return {
    uid: `shift-${s.shiftId}@${uidHost(publicUrl)}`,
    start: s.startsAt,
    end: s.endsAt,
    summary: shiftSummary(s.role, s.eventTitle, words),
    location: venueLine(s.venue),
    description: [`${s.groupName}.`, s.bench ? words('bench', { bench: s.bench }) : '', words('page', { url })]
      .filter(Boolean)
      .join('\n'),
    url,
    stamp: now,
  };
}

/** How far back a volunteer's feed reaches, so last week's shift is still there to look back on. */
export const FEED_PAST_DAYS = 30;
