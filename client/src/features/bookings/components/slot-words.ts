import type { Bookability } from '../../../../../shared/booking/bookability';

type Translate = (key: string, values?: Record<string, unknown>) => string;

/** What a time tile and the form say about a time that cannot be booked as it is, in the reader's language. */
export function slotWords(b: Exclude<Bookability, { ok: true }>, t: Translate): { message: string; short: string } {
  if (b.reason === 'past') return { message: t('booking.slot.past'), short: t('booking.slot.pastShort') };
  if (b.reason === 'full')
    return { message: t('booking.slot.full'), short: t('booking.slot.fullShort', { free: b.free }) };
  const kind = t(`booking.kind.${b.skill}`);
  return {
    message: t('booking.slot.skillFull', { limit: b.limit, left: b.left, wanted: b.wanted, kind }),
    short:
      b.left === 0
        ? t('booking.slot.skillFullShort', { kind })
        : t('booking.slot.skillLeftShort', { kind, left: b.left }),
  };
}
