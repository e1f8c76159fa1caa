import type { ItemStatus } from '../../../../../shared/event-day/constants';
import { dayTallies } from '../../../../../shared/event-day/tallies';
import { useT } from '../../../lib/i18n';

/**
 * How many items are in each state today, named as the status chips name them. The desk and the live view both show
 * this list, so a state has the same word and the same number on both.
 */
export function StatusTallies({ counts, compact = false }: { counts: Record<ItemStatus, number>; compact?: boolean }) {
  const t = useT();
  return (
    <ul
      aria-label={t('desk.tallies')}
      className={
        compact ? 'flex flex-wrap gap-2 text-sm' : 'grid grid-cols-[repeat(auto-fill,minmax(6.5rem,1fr))] gap-2'
      }
    >
      {dayTallies(counts).map((d) =>
        compact ? (
          <li key={d.status} className="rounded-lg bg-white px-3 py-1.5 ring-1 ring-ink/10">
            <b data-testid={`count-${d.status}`}>{d.count}</b> <span>{t(`fixer.status.${d.status}`)}</span>
          </li>
        ) : (
          <li key={d.status} className="rounded-lg bg-white px-3 py-2 shadow-sm ring-1 ring-ink/5">
            <p className="text-2xl font-extrabold text-navy tabular-nums" data-testid={`count-${d.status}`}>
              {d.count}
            </p>
            <p className="text-xs font-semibold text-ink-soft">{t(`fixer.status.${d.status}`)}</p>
          </li>
        ),
      )}
    </ul>
  );
}
