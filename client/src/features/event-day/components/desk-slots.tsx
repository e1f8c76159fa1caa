import { Link } from 'react-router';
import { formatTimeRange } from '../../../../../shared/format';
import { paths } from '../../../config/paths';
import type { DeskBooking, DeskView } from '../api/types';
import { StatusChip } from './status-chip';
import { useLanguage, useT } from '../../../lib/i18n';

/** The day's bookings under their slot, the current slot marked; choosing one opens its check-in. */
export function DeskSlots({
  desk,
  shown,
  filtered,
  selected,
  onSelect,
}: {
  desk: DeskView;
  shown: (b: DeskBooking) => boolean;
  filtered: boolean;
  selected: string | null;
  onSelect: (reference: string) => void;
}) {
  const t = useT();
  const lang = useLanguage();
  return (
    <>
      {desk.slots.map((s) => {
        const list = s.bookings.filter(shown);
        if (filtered && list.length === 0) return null;
        const time = formatTimeRange(s.startsAt, s.endsAt, desk.event.timeZone, lang);
        return (
          <section key={s.id} aria-label={t('desk.slots.slot', { time })}>
            <div className="mb-2 flex flex-wrap items-center gap-3">
              <h2 className="text-lg">{time}</h2>
              {s.id === desk.currentSlotId && (
                <span className="rounded-full bg-copper px-2 py-0.5 text-xs font-bold text-white">
                  {t('desk.slots.now')}
                </span>
              )}
              {s.bookings.some((b) => b.items.some((i) => i.tagCode)) && (
                <Link
                  className="ml-auto inline-flex min-h-11 items-center rounded-lg px-4 text-sm font-semibold text-navy ring-1 ring-navy/30 hover:bg-navy/5"
                  to={paths.tags(desk.event.id, { slotId: s.id })}
                  target="_blank"
                >
                  {t('desk.slots.printSlot')}
                </Link>
              )}
            </div>
            {list.length === 0 ? (
              <p className="rounded-lg border border-dashed border-ink/15 px-4 py-3 text-sm text-ink-soft">
                {t('desk.slots.none')}
              </p>
            ) : (
              <ul className="divide-y divide-ink/10 overflow-hidden rounded-xl bg-white ring-1 ring-ink/5">
                {list.map((b) => (
                  <li key={b.id}>
                    <button
                      type="button"
                      onClick={() => onSelect(b.reference)}
                      className={`flex w-full flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3 text-left hover:bg-navy/5 focus:bg-navy/5 ${selected === b.reference ? 'bg-copper-light/60' : ''}`}
                    >
                      <span className="font-mono font-bold text-navy">{b.reference}</span>
                      <span className="font-semibold">{b.visitorName}</span>
                      {b.walkIn && (
                        <span className="rounded-full bg-navy/10 px-2 py-0.5 text-xs font-bold text-navy">
                          {t('desk.walkInChip')}
                        </span>
                      )}
                      <span className="ml-auto flex flex-wrap gap-2">
                        {b.items.map((i) => (
                          <span key={i.id} className="flex items-center gap-1 text-sm">
                            {i.categoryName}
                            {i.queueNumber !== null && <b className="text-navy">#{i.queueNumber}</b>}{' '}
                            <StatusChip status={i.status} />
                          </span>
                        ))}
                      </span>
                    </button>
                  </li>
                ))}
              </ul>
            )}
          </section>
        );
      })}
    </>
  );
}
