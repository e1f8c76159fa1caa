import { Link } from 'react-router';
import { formatDay, formatTimeRange } from '../../../../../shared/format';
import { Card, EmptyState, PageTitle } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import type { DeskEvent } from '../api/types';

/** The sessions reception can open, today's first. */
export function DeskHome({ events: data }: { events: DeskEvent[] }) {
  const open = data.filter((e) => e.open);
  const later = data.filter((e) => !e.open);
  return (
    <div className="space-y-6">
      <PageTitle title="Reception desk" lead="Check visitors in, take walk-ins and print the intake tags." />
      {open.length === 0 && (
        <EmptyState title="No session is open for check-in" icon="☑">
          Check-in opens on the day of a session.{' '}
          {later[0] && (
            <>
              The next one is {later[0].title} on {formatDay(later[0].startsAt, later[0].timeZone)}.
            </>
          )}
        </EmptyState>
      )}
      <div className="grid gap-4 md:grid-cols-2">
        {open.map((e) => (
          <Card key={e.id}>
            <p className="text-sm text-ink-soft">{e.groupName}</p>
            <h2 className="text-xl">{e.title}</h2>
            <p className="mb-4">
              {formatDay(e.startsAt, e.timeZone)}, {formatTimeRange(e.startsAt, e.endsAt, e.timeZone)}
            </p>
            <Link
              to={paths.deskEvent(e.id)}
              className="inline-flex min-h-11 items-center rounded-lg bg-copper px-4 font-bold text-white hover:bg-copper-dark"
            >
              Open the desk
            </Link>
          </Card>
        ))}
      </div>
      {later.length > 0 && (
        <section>
          <h2 className="mb-2 text-lg">Coming up</h2>
          <ul className="divide-y divide-ink/10 rounded-xl bg-white ring-1 ring-ink/5">
            {later.map((e) => (
              <li key={e.id} className="px-4 py-3">
                {e.title} — {formatDay(e.startsAt, e.timeZone)}{' '}
                <span className="text-sm text-ink-soft">({e.groupName}; check-in opens on the day)</span>
              </li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
