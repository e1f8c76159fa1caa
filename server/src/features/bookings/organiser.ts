import type { AppContext } from '../../context';
import { eventBookingRows } from './queries/organiser';
import { categoryText } from '../../i18n';
import { DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';

/** What is coming to an event: every booking with its items, and counts by category and skill. */
export async function eventBookings(ctx: AppContext, eventId: number, lang: Language = DEFAULT_LANGUAGE) {
  const found = await eventBookingRows(ctx.database.db, eventId);
  const { rows, photos, waiting } = found;
  // The kinds of item in the reader's language (a group's own kinds keep their stored name).
  const items = found.items.map(({ categorySlug, ...i }) => ({
    ...i,
    categoryName: categoryText(lang, categorySlug, 'name', i.categoryName),
  }));
  const confirmedIds = new Set(rows.filter((r) => r.status === 'confirmed').map((r) => r.id));
  const counted = items.filter((i) => confirmedIds.has(i.bookingId));
  const tally = (key: (i: (typeof counted)[number]) => string) => {
    const m = new Map<string, number>();
    for (const i of counted) m.set(key(i), (m.get(key(i)) ?? 0) + 1);
    return [...m]
      .map(([name, count]) => ({ name, count }))
      .sort((a, b) => b.count - a.count || a.name.localeCompare(b.name));
  };
  return {
    bookings: rows.map((r) => ({
      ...r,
      items: items
        .filter((i) => i.bookingId === r.id)
        .map((i) => ({
          ...i,
          mains: Boolean(i.mains),
          battery: Boolean(i.battery),
          photoIds: photos.filter((p) => p.itemId === i.id).map((p) => p.id),
        })),
    })),
    waiting,
    summary: {
      items: counted.length,
      bookings: confirmedIds.size,
      byCategory: tally((i) => i.categoryName),
      bySkill: tally((i) => i.skill),
      mains: counted.filter((i) => i.mains).length,
    },
  };
}
