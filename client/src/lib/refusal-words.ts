import type { ScreenRefusal } from '../../../shared/booking/screening';
import { tr } from './i18n';

/**
 * Why the booking's screening (shared/booking/screening) refuses an item, in the reader's words: a hazard's and the
 * group's exclusion from the booking catalog, a kind's own refusal as the API gave it (in the reader's language).
 */
export function refusalWords(r: ScreenRefusal): string {
  if (r.code === 'hazard')
    return `${tr(`booking.hazard.${r.hazard}.reason`)} ${tr(`booking.hazard.${r.hazard}.suggestion`)}`;
  if (r.code === 'category') return `${r.reason} ${r.suggestion}`;
  return tr('booking.refusedGeneric', { group: r.group });
}
