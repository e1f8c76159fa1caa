import type { Response } from 'express';
import ical from 'ical-generator';
import type { CalendarEntry } from '../../../shared/calendar';

/**
 * Writes entries as an iCalendar file (RFC 5545) with ical-generator. Times go out in UTC ("Z"), which every
 * calendar app shows in its own zone, so summer and winter time need no VTIMEZONE of ours.
 */
export function calendarText(name: string, entries: CalendarEntry[], refreshHours?: number) {
  const cal = ical({
    prodId: { company: 'Mendery', product: 'Mendery', language: 'EN' },
    name,
    ...(refreshHours ? { ttl: refreshHours * 3600 } : {}),
  });
  for (const e of entries)
    cal.createEvent({
      id: e.uid,
      start: e.start,
      end: e.end,
      stamp: e.stamp,
      summary: e.summary,
      location: e.location,
      description: e.description,
      url: e.url,
    });
  return cal.toString();
}

/** Sends a calendar with its media type; `attachment` makes the browser save it as `filename`. */
export function sendCalendar(res: Response, text: string, filename: string, disposition: 'attachment' | 'inline') {
  res.setHeader('Content-Type', 'text/calendar; charset=utf-8');
  res.setHeader('Content-Disposition', `${disposition}; filename="${filename.replace(/[^\w.-]/g, '-')}"`);
  res.setHeader('Cache-Control', 'no-store');
  res.send(text);
}
