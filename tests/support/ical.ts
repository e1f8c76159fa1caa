import ICAL from 'ical.js';

/**
 * Reads an iCalendar file with ical.js, a parser independent of the package that writes Mendery's files, and
 * answers each VEVENT's properties (RFC 5545 §3.6.1: UID, DTSTAMP, DTSTART, DTEND, SUMMARY, LOCATION, URL).
 */
export function readCalendar(text: string) {
  const cal = new ICAL.Component(ICAL.parse(text));
  return {
    name: cal.getFirstPropertyValue('name') ?? cal.getFirstPropertyValue('x-wr-calname'),
    version: cal.getFirstPropertyValue('version'),
    events: cal.getAllSubcomponents('vevent').map((c) => {
      const e = new ICAL.Event(c);
      return {
        uid: e.uid,
        start: e.startDate.toJSDate(),
        end: e.endDate.toJSDate(),
        startIsUtc: e.startDate.zone?.tzid === 'UTC',
        stamp: (c.getFirstPropertyValue('dtstamp') as ICAL.Time | null)?.toJSDate() ?? null,
        summary: e.summary,
        location: e.location,
        description: e.description,
        url: String(c.getFirstPropertyValue('url') ?? ''),
      };
    }),
  };
}
