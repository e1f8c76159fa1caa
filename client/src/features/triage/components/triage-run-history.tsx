import type { Board } from '../api/types';
import { formatTime } from '../../../../../shared/format';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';

/** Earlier runs, each with a link to a summary of what went in and what came out. */
export function TriageRunHistory({ board }: { board: Board }) {
  const tz = board.event.timeZone;
  if (board.runs.length === 0) return null;
  return (
    <details className="mt-4 rounded-xl bg-white p-4 ring-1 ring-ink/5">
      <summary className="cursor-pointer font-bold text-navy">Earlier runs ({board.runs.length})</summary>
      <ul className="mt-2 text-sm">
        {board.runs.map((r) => (
          <li key={r.id}>
            {new Date(r.createdAt).toLocaleString('en-GB', { timeZone: tz })}: {r.assigned} placed, {r.unassigned}{' '}
            waiting, {r.lockedKept} locked kept
            {r.slotId
              ? ` (slot ${formatTime(board.slots.find((s) => s.id === r.slotId)?.startsAt ?? '', tz)})`
              : ''} ·{' '}
            <Link className="underline" to={paths.triageRun(board.event.id, r.id)}>
              what went in and came out
            </Link>
          </li>
        ))}
      </ul>
    </details>
  );
}
