import type { ItemStatus } from '../../../../../shared/event-day/constants';
import { dayTallies } from '../../../../../shared/event-day/tallies';

/**
 * How many items are in each state today, named as the status chips name them. The desk and the live view both show
 * this list, so a state has the same word and the same number on both.
 */
export function StatusTallies({ counts, compact = false }: { counts: Record<ItemStatus, number>; compact?: boolean }) {
  return (
    <ul
      aria-label="Items today by state"
      className={
        compact ? 'flex flex-wrap gap-2 text-sm' : 'grid grid-cols-[repeat(auto-fill,minmax(6.5rem,1fr))] gap-2'
      }
    >
      {dayTallies(counts).map((t) =>
        compact ? (
          <li key={t.status} className="rounded-lg bg-white px-3 py-1.5 ring-1 ring-ink/10">
            <b data-testid={`count-${t.status}`}>{t.count}</b> <span>{t.label}</span>
          </li>
        ) : (
          <li key={t.status} className="rounded-lg bg-white px-3 py-2 shadow-sm ring-1 ring-ink/5">
            <p className="text-2xl font-extrabold text-navy tabular-nums" data-testid={`count-${t.status}`}>
              {t.count}
            </p>
            <p className="text-xs font-semibold text-ink-soft">{t.label}</p>
          </li>
        ),
      )}
    </ul>
  );
}
