import type { Rota } from '../api/types';
import { SKILL_LABELS, type Skill } from '../../../../../shared/constants';
import { formatTimeRange } from '../../../../../shared/format';
import { Alert, EmptyState } from '../../../components/ui/feedback';
import { useSeatFixer } from '../api/seat-fixer';

/**
 * Who answered, with their hours and skills, and a seat for each one coming; `benches` are the session's, and
 * `onSeated` runs after a seat changes (the triage board places by seats).
 */
export function ShiftTable({
  eventId,
  shifts,
  benches,
  timeZone,
  onSeated,
}: {
  eventId: number;
  shifts: Rota['shifts'];
  benches: { id?: number; name: string }[];
  timeZone: string;
  onSeated?: () => void;
}) {
  const seat = useSeatFixer(eventId, onSeated);
  if (shifts.length === 0)
    return (
      <EmptyState title="Nobody has answered yet" icon="☰">
        Fixers and reception say whether they come on their own page.
      </EmptyState>
    );
  return (
    <>
      {seat.error && <Alert tone="error">{seat.error.message}</Alert>}
      <div className="overflow-x-auto rounded-xl bg-white ring-1 ring-ink/5">
        <table className="w-full text-left text-sm">
          <thead className="bg-navy/5 text-navy">
            <tr>
              <th className="px-4 py-2">Name</th>
              <th className="px-4 py-2">Answer</th>
              <th className="px-4 py-2">Hours</th>
              <th className="px-4 py-2">Skills</th>
              <th className="px-4 py-2">Seat</th>
            </tr>
          </thead>
          <tbody>
            {shifts.map((s) => (
              <tr key={s.userId} className="border-t border-ink/5">
                <td className="px-4 py-2 font-semibold">{s.name}</td>
                <td className="px-4 py-2">{s.coming ? 'Coming' : 'Not coming'}</td>
                <td className="px-4 py-2">{s.coming ? formatTimeRange(s.startsAt, s.endsAt, timeZone) : '—'}</td>
                <td className="px-4 py-2 text-ink-soft">
                  {Object.entries(s.skills)
                    .map(([k, l]) => `${SKILL_LABELS[k as Skill] ?? k} ${l}`)
                    .join(', ') || '—'}
                </td>
                <td className="px-4 py-2">
                  {s.coming && (
                    <select
                      aria-label={`Seat for ${s.name}`}
                      value={s.benchId ?? ''}
                      onChange={(e) =>
                        seat.mutate({ userId: s.userId, benchId: e.target.value ? Number(e.target.value) : null })
                      }
                      className="rounded border border-ink/20 px-2 py-1"
                    >
                      <option value="">Free to move</option>
                      {benches.map((b) => (
                        <option key={b.id} value={b.id}>
                          {b.name}
                        </option>
                      ))}
                    </select>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
