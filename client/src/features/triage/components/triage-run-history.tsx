import type { Board } from '../api/types';
import { formatTime, intlLocale } from '../../../../../shared/format';
import { useLanguage, useT } from '../../../lib/i18n';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';

/** Earlier runs, each with a link to a summary of what went in and what came out. */
export function TriageRunHistory({ board }: { board: Board }) {
  const t = useT();
  const lang = useLanguage();
  const tz = board.event.timeZone;
  if (board.runs.length === 0) return null;
  return (
    <details className="mt-4 rounded-xl bg-white p-4 ring-1 ring-ink/5">
      <summary className="cursor-pointer font-bold text-navy">
        {t('organise.triage.history.title', { n: board.runs.length })}
      </summary>
      <ul className="mt-2 text-sm">
        {board.runs.map((r) => (
          <li key={r.id}>
            {t('organise.triage.history.run', {
              when: new Date(r.createdAt).toLocaleString(intlLocale(lang), { timeZone: tz }),
              assigned: r.assigned,
              unassigned: r.unassigned,
              locked: r.lockedKept,
            })}
            {r.slotId
              ? ` ${t('organise.triage.history.slot', {
                  time: formatTime(board.slots.find((s) => s.id === r.slotId)?.startsAt ?? '', tz, lang),
                })}`
              : ''}{' '}
            ·{' '}
            <Link className="underline" to={paths.triageRun(board.event.id, r.id)}>
              {t('organise.triage.history.link')}
            </Link>
          </li>
        ))}
      </ul>
    </details>
  );
}
