import { ITEM_STATUS_LABELS } from '../../../../shared/event-day/constants';
import type { ReactNode } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import type { ItemStatus } from '../../../../shared/event-day/constants';
import { formatDay, formatTime } from '../../../../shared/format';
import { EventTabs } from '../../components/layouts/event-tabs';
import { Alert, Card, EmptyState, PageTitle, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { liveViewQuery, useLiveView } from '../../features/event-day/api/get-live-view';
import { queryClient } from '../../lib/query-client';
import type { LiveCard, LiveView } from '../../features/event-day/api/types';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(liveViewQuery(Number(params.eventId))).catch(() => null);

const COUNT_TILES: { status: ItemStatus; label: string }[] = (
  ['checked-in', 'waiting', 'at-bench', 'done', 'no-show', 'withdrawn', 'booked'] as const
).map((status) => ({ status, label: status === 'booked' ? 'Still to come' : ITEM_STATUS_LABELS[status] }));

const linkButton = 'inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 py-2 font-bold transition';

const estimate = (m: number | null) => (m === null ? '—' : m <= 0 ? 'next' : `about ${m} min`);
const queueNo = (n: number | null) => (n === null ? 'No. —' : `No. ${n}`);
const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** The organiser's view of the day as it happens: counts, warnings, each bench's items, and who is free. */
export function LiveViewPage() {
  const eventId = Number(useParams().eventId);
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
        <ul className="grid grid-cols-[repeat(auto-fill,minmax(6.5rem,1fr))] gap-2">
          {COUNT_TILES.map((t) => (
            <li key={t.status} className="rounded-lg bg-white px-3 py-2 shadow-sm ring-1 ring-ink/5">
              <p className="text-2xl font-extrabold text-navy tabular-nums" data-testid={`count-${t.status}`}>
                {v.counts[t.status] ?? 0}
              </p>
              <p className="text-xs font-semibold text-ink-soft">{t.label}</p>
            </li>
          ))}
        </ul>
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

function BenchCard({ bench, tz }: { bench: LiveView['benches'][number]; tz: string }) {
  return (
    <Card className="p-4 sm:p-5">
      <section aria-label={bench.name}>
        <header className="mb-3 flex flex-wrap items-baseline justify-between gap-x-3">
          <h2 className="text-lg">{bench.name}</h2>
          <p className="text-sm text-ink-soft">
            {bench.atBench.length} at the bench · {bench.waiting.length} waiting · {bench.done.length} done
          </p>
        </header>
        <div className="grid gap-4 md:grid-cols-3">
          <Column title="At the bench" count={bench.atBench.length} empty="Nothing in hand.">
            {bench.atBench.map((c) => (
              <li key={c.id}>
                <ItemLink card={c} tone="active">
                  <p className="text-xs text-ink-soft">
                    {c.fixerName ?? 'No fixer named'}
                    {c.startedAt ? ` · started ${formatTime(c.startedAt, tz)}` : ''}
                  </p>
                </ItemLink>
              </li>
            ))}
          </Column>
          <Column title="Waiting" count={bench.waiting.length} empty="No one waiting.">
            {bench.waiting.map((c) => (
              <li key={c.id}>
                <ItemLink card={c}>
                  <WaitLine card={c} />
                </ItemLink>
              </li>
            ))}
          </Column>
          <Column title="Done" count={bench.done.length} empty="None yet.">
            {bench.done.map((c) => (
              <li key={c.id}>
                <ItemLink card={c} tone="done">
                  <p className="text-xs font-semibold text-sage">
                    {c.outcomeLabel ?? 'Done'}
                    {c.doneAt ? <span className="font-normal text-ink-soft"> · {formatTime(c.doneAt, tz)}</span> : null}
                  </p>
                </ItemLink>
              </li>
            ))}
          </Column>
        </div>
      </section>
    </Card>
  );
}

/** One of a bench's three sections; children are the list's <li> elements. */
function Column({
  title,
  count,
  empty,
  children,
}: {
  title: string;
  count: number;
  empty: string;
  children: ReactNode;
}) {
  return (
    <div className="min-w-0">
      <h3 className="mb-1.5 text-sm">
        {title} <span className="font-semibold text-ink-soft">· {count}</span>
      </h3>
      {count === 0 ? <p className="text-sm text-ink-soft">{empty}</p> : <ul className="space-y-2">{children}</ul>}
    </div>
  );
}

function WaitLine({ card }: { card: LiveCard }) {
  return (
    <p className="text-xs text-ink-soft">
      {card.waitedMinutes !== null ? `waited ${card.waitedMinutes} min` : 'not checked in'} · est.{' '}
      {estimate(card.estimatedWaitMinutes)}
    </p>
  );
}

function ItemLink({ card, tone, children }: { card: LiveCard; tone?: 'active' | 'done'; children: ReactNode }) {
  const ring =
    tone === 'active'
      ? 'ring-copper/60 bg-copper-light/30'
      : tone === 'done'
        ? 'ring-sage/40 bg-sage-light/30'
        : 'ring-ink/10 bg-white';
  return (
    <Link
      to={paths.item(card.id)}
      className={`block rounded-lg p-2.5 text-sm ring-1 transition hover:ring-navy ${ring}`}
    >
      <p className="flex items-baseline gap-2">
        <span className="shrink-0 font-extrabold text-navy tabular-nums">{queueNo(card.queueNumber)}</span>
        <span className="min-w-0 truncate font-semibold">{card.label}</span>
      </p>
      <p className="truncate text-xs text-ink-soft">
        {card.visitor}
        {card.tagCode ? ` · ${card.tagCode}` : ''}
      </p>
      {children}
    </Link>
  );
}
