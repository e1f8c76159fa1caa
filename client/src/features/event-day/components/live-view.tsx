import { Link } from 'react-router';
import { formatDay, formatTime } from '../../../../../shared/format';
import { EventTabs } from '../../../components/layouts/event-tabs';
import { Alert, Card, EmptyState, PageTitle, Spinner } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useLiveView } from '../api/get-live-view';
import { BenchCard, ItemLink, WaitLine } from './live-bench-card';
import { StatusTallies } from './status-tallies';

const linkButton = 'inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 py-2 font-bold transition';

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** The organiser's view of the day as it happens: counts, warnings, each bench's items, and who is free. */
export function LiveViewBody({ eventId }: { eventId: number }) {
  const live = useLiveView(eventId);
  if (live.isPending) return <Spinner label="Loading the live view…" />;
  if (!live.data) return <Alert tone="error">{live.error?.message ?? 'The live view could not be loaded.'}</Alert>;
  const v = live.data;
  const tz = v.event.timeZone;
  const free = v.fixers.filter((f) => !f.busy).length;

  return (
    <div>
      <Link to={paths.groupEvents(v.event.groupId)} className="text-sm font-bold text-navy underline">
        ← {v.event.groupName}: all sessions
      </Link>
      <div className="mt-2">
        <PageTitle
          title={v.event.title}
          lead={<span className="font-bold text-copper-dark">{formatDay(v.event.startsAt, tz)} · live</span>}
        />
      </div>
      <EventTabs eventId={eventId} />

      <div className="mb-4 flex flex-wrap items-center gap-2">
        <a
          href={paths.hall(eventId)}
          target="_blank"
          rel="noreferrer"
          className={`${linkButton} bg-copper text-white hover:bg-copper-dark`}
        >
          Open hall display <span aria-hidden>↗</span>
          <span className="sr-only">(opens in a new tab)</span>
        </a>
        <Link
          to={paths.tags(eventId)}
          target="_blank"
          className={`${linkButton} bg-white text-navy ring-1 ring-navy/25 hover:bg-navy/5`}
        >
          Print all tags
        </Link>
        <p className="w-full text-sm text-ink-soft sm:ml-auto sm:w-auto" aria-live="polite">
          Updated {formatTime(new Date(live.dataUpdatedAt), tz)}
          {live.isFetching ? ' · refreshing…' : ''}
        </p>
      </div>

      {live.isError && (
        <div className="mb-4">
          <Alert tone="caution" title="The last refresh failed">
            Showing what was known at {formatTime(new Date(live.dataUpdatedAt), tz)}; this page tries again by itself. (
            {live.error.message})
          </Alert>
        </div>
      )}

      <section aria-label="Counts" className="mb-5">
        <StatusTallies counts={v.counts} />
      </section>

      {v.warnings.length > 0 && (
        <div className="mb-5">
          <Alert tone="caution" title={plural(v.warnings.length, 'thing needs', 'things need') + ' attention'}>
            <ul className="list-disc space-y-0.5 pl-5">
              {v.warnings.map((w, i) => (
                <li key={`${w.kind}-${w.itemId ?? w.userId ?? i}`}>
                  {w.itemId ? (
                    <Link to={paths.item(w.itemId)} className="underline">
                      {w.message}
                    </Link>
                  ) : (
                    w.message
                  )}
                </li>
              ))}
            </ul>
          </Alert>
        </div>
      )}

      <div className="grid gap-5 lg:grid-cols-[1fr_16rem]">
        <div className="min-w-0 space-y-4">
          {v.benches.length === 0 ? (
            <EmptyState title="No benches set out" icon="▭">
              Add this session’s benches under{' '}
              <Link to={paths.benches(eventId)} className="font-bold text-navy underline">
                Benches
              </Link>
              ; items then show here by bench.
            </EmptyState>
          ) : (
            v.benches.map((b) => <BenchCard key={b.id} bench={b} tz={tz} />)
          )}

          <Card className="p-4 sm:p-5">
            <section aria-label="Not placed yet">
              <h2 className="text-lg">
                Not placed yet <span className="text-sm font-semibold text-ink-soft">· {v.unplaced.length}</span>
              </h2>
              {v.unplaced.length === 0 ? (
                <p className="mt-1 text-sm text-ink-soft">Every item in the queue has a bench.</p>
              ) : (
                <>
                  <p className="mb-2 text-sm text-ink-soft">
                    Checked in but with no bench: place them on the{' '}
                    <Link to={paths.board(eventId)} className="font-bold text-navy underline">
                      triage board
                    </Link>
                    .
                  </p>
                  <ul className="grid min-w-0 gap-2 sm:grid-cols-2 xl:grid-cols-3">
                    {v.unplaced.map((c) => (
                      <li key={c.id} className="min-w-0">
                        <ItemLink card={c}>
                          <WaitLine card={c} />
                        </ItemLink>
                      </li>
                    ))}
                  </ul>
                </>
              )}
            </section>
          </Card>
        </div>

        <aside aria-label="Fixers on shift" className="min-w-0">
          <Card className="p-4">
            <h2 className="text-lg">Fixers on shift</h2>
            <p className="mb-2 text-sm text-ink-soft">
              {v.fixers.length === 0
                ? 'Nobody’s shift covers this moment.'
                : `${v.fixers.length - free} busy · ${free} free`}
            </p>
            {v.fixers.length > 0 && (
              <ul className="divide-y divide-ink/5">
                {v.fixers.map((f) => (
                  <li key={f.userId} className="flex items-center justify-between gap-2 py-1.5 text-sm">
                    <span className="min-w-0 truncate font-semibold">{f.name}</span>
                    <span
                      className={`shrink-0 rounded-full px-2 py-0.5 text-xs font-bold ${f.busy ? 'bg-navy text-white' : 'bg-sage-light text-sage'}`}
                    >
                      {f.busy ? 'busy' : 'free'}
                    </span>
                  </li>
                ))}
              </ul>
            )}
          </Card>
        </aside>
      </div>
    </div>
  );
}
