import { Link } from 'react-router';
import type { EventSummary } from '../../../../../shared/api/events';
import type { SessionFigures } from '../../../../../shared/api/impact';
import { formatDay, formatTimeRange } from '../../../../../shared/format';
import { paths } from '../../../config/paths';
import { PlacesBar, StatusBadge } from './places-bar';

const when = (e: EventSummary) =>
  `${formatDay(e.startsAt, e.timeZone)} · ${formatTimeRange(e.startsAt, e.endsAt, e.timeZone)}`;

/** A session still to come (or running today): its state, date and free places. */
export function ComingRow({ e, today }: { e: EventSummary; today: boolean }) {
  return (
    <Link
      to={paths.manageEvent(e.id)}
      className={`grid gap-3 rounded-xl bg-white p-4 ring-1 hover:ring-copper sm:grid-cols-[1fr_14rem] sm:items-center ${today ? 'ring-2 ring-copper' : 'ring-ink/5'}`}
    >
      <div>
        <div className="flex flex-wrap items-center gap-2">
          {today && (
            <span className="rounded-full bg-copper px-2.5 py-0.5 text-xs font-extrabold text-white">Today</span>
          )}
          <StatusBadge status={e.status} />
          <span className="text-sm font-bold text-copper-dark">{when(e)}</span>
        </div>
        <p className="mt-1 text-lg font-extrabold text-navy">{e.title}</p>
        <p className="text-sm text-ink-soft">{e.venue.name}</p>
      </div>
      {e.status === 'cancelled' ? (
        <p className="text-sm font-semibold text-ink-soft">Called off; everyone booked was told.</p>
      ) : (
        <PlacesBar free={e.freePlaces} total={e.totalPlaces} />
      )}
    </Link>
  );
}

const kg = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 1 });

/** What a past session came to, in words; nothing to say while the figures load or for roles that do not see them. */
function Outcomes({ e, figures }: { e: EventSummary; figures: SessionFigures | null | undefined }) {
  if (e.status === 'cancelled') return <p className="text-sm text-ink-soft">Called off: no figures.</p>;
  if (figures === undefined) return null;
  if (figures === null || figures.items === 0)
    return <p className="text-sm text-ink-soft">No items were recorded at this session.</p>;
  const parts = [
    [figures.fixed, 'fixed'],
    [figures.partsNeeded, 'need a part'],
    [figures.advice, 'got advice'],
    [figures.endOfLife, 'could not be fixed'],
    [figures.unknown, 'no outcome written'],
  ] as const;
  return (
    <dl className="flex flex-wrap gap-x-4 gap-y-1 text-sm" aria-label="What came of it">
      <div className="flex gap-1">
        <dt className="sr-only">Items seen</dt>
        <dd className="font-extrabold text-navy">
          {figures.items} item{figures.items === 1 ? '' : 's'} seen
        </dd>
      </div>
      {parts
        .filter(([n]) => n > 0)
        .map(([n, label]) => (
          <div key={label} className="flex gap-1">
            <dt className="sr-only">{label}</dt>
            <dd>
              <span className="font-bold">{n}</span> {label}
            </dd>
          </div>
        ))}
      <div className="flex gap-1">
        <dt className="sr-only">Kept out of the bin</dt>
        <dd>
          <span className="font-bold">{kg.format(figures.kgDiverted)} kg</span> kept out of the bin
        </dd>
      </div>
    </dl>
  );
}

/** A session that is over: its date and what came of it, with the way to its report. */
export function PastRow({ e, figures }: { e: EventSummary; figures: SessionFigures | null | undefined }) {
  return (
    <div className="grid gap-2 rounded-xl bg-white/70 p-4 ring-1 ring-ink/5 sm:grid-cols-[1fr_auto] sm:items-center">
      <div>
        <p className="text-sm font-bold text-ink-soft">
          {when(e)} · {e.venue.name}
          {e.status === 'cancelled' && (
            <>
              {' '}
              <StatusBadge status="cancelled" />
            </>
          )}
        </p>
        <p className="font-extrabold text-navy">
          <Link to={paths.manageEvent(e.id)} className="underline-offset-2 hover:underline">
            {e.title}
          </Link>
        </p>
        <Outcomes e={e} figures={figures} />
      </div>
      {e.status !== 'cancelled' && figures !== undefined && (
        <Link
          to={paths.report(e.id)}
          className="inline-flex min-h-11 items-center rounded-lg px-3 text-sm font-bold text-navy ring-1 ring-navy/25 hover:bg-navy/5"
        >
          Report<span className="sr-only"> for {formatDay(e.startsAt, e.timeZone)}</span>
        </Link>
      )}
    </div>
  );
}
