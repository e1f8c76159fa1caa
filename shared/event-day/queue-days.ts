import { intlLocale } from '../format';
import { DEFAULT_LANGUAGE, type Language } from '../i18n/languages';

/**
 * The fixer's queue by day: one group per calendar day in the item's group time zone, today first, then the days
 * to come in order, then past days apart (most recent first). Pure: `now` comes from the caller.
 */
export type QueueDayKind = 'today' | 'upcoming' | 'past';

export interface QueueDay<T> {
  /** The day in the group's time zone, as YYYY-MM-DD. */
  date: string;
  kind: QueueDayKind;
  /** "Saturday 12 December" in the reader's language; the year too when it is not this year's. */
  label: string;
  items: T[];
}

const dateKey = (d: Date, timeZone: string) =>
  new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(d);

function dayLabel(d: Date, timeZone: string, now: Date, lang: Language) {
  const year = (x: Date) => new Intl.DateTimeFormat('en-GB', { timeZone, year: 'numeric' }).format(x);
  const withYear = year(d) !== year(now);
  if (lang !== 'en')
    // The language's own order and marks ("Samstag, 12. Dezember", "samedi 12 décembre").
    return new Intl.DateTimeFormat(intlLocale(lang), {
      timeZone,
      weekday: 'long',
      day: 'numeric',
      month: 'long',
      ...(withYear ? { year: 'numeric' } : {}),
    }).format(d);
  const p = Object.fromEntries(
    new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' })
      .formatToParts(d)
      .map((x) => [x.type, x.value]),
  );
  // Built from parts: Intl puts a comma after the weekday once the year is in, and we want none.
  return [p.weekday, p.day, p.month, ...(withYear ? [p.year] : [])].join(' ');
}

const kindRank: Record<QueueDayKind, number> = { today: 0, upcoming: 1, past: 2 };

/** Groups items (already in queue order) by the day they are planned for; order within a day is kept. */
export function queueDays<T extends { slotStartsAt: Date | string; timeZone: string }>(
  items: readonly T[],
  now: Date,
  lang: Language = DEFAULT_LANGUAGE,
): QueueDay<T>[] {
  const days = new Map<string, QueueDay<T>>();
  for (const item of items) {
    const at = new Date(item.slotStartsAt);
    const date = dateKey(at, item.timeZone);
    const today = dateKey(now, item.timeZone);
    let day = days.get(date);
    if (!day) {
      const kind: QueueDayKind = date === today ? 'today' : date > today ? 'upcoming' : 'past';
      day = { date, kind, label: dayLabel(at, item.timeZone, now, lang), items: [] };
      days.set(date, day);
    }
    day.items.push(item);
  }
  return [...days.values()].sort(
    (a, b) =>
      kindRank[a.kind] - kindRank[b.kind] ||
      (a.kind === 'past' ? b.date.localeCompare(a.date) : a.date.localeCompare(b.date)),
  );
}

/** The item a fixer takes next: the first of today's or the coming days', never one left over from a past day. */
export function nextQueued<T extends { slotStartsAt: Date | string; timeZone: string }>(
  items: readonly T[],
  now: Date,
): T | undefined {
  return queueDays(items, now).find((d) => d.kind !== 'past')?.items[0];
}
