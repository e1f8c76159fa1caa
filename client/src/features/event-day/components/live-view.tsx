import { Link } from 'react-router';
import { formatDay, formatTime } from '../../../../../shared/format';
import { EventTabs } from '../../../components/layouts/event-tabs';
import { Alert, Card, EmptyState, PageTitle, Spinner } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useLiveView } from '../api/get-live-view';
import { BenchCard, ItemLink, WaitLine } from './live-bench-card';
import { StatusTallies } from './status-tallies';
import { tr, trParts, useLanguage, useT } from '../../../lib/i18n';

const linkButton = 'inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 py-2 font-bold transition';

/** The organiser's view of the day as it happens: counts, warnings, each bench's items, and who is free. */
export function LiveViewBody({ eventId }: { eventId: number }) {
  const t = useT();
  const lang = useLanguage();
  const live = useLiveView(eventId);
  if (live.isPending) return <Spinner label={t('desk.live.loading')} />;
  if (!live.data) return <Alert tone="error">{live.error ? tr(live.error.message) : t('desk.live.loadFailed')}</Alert>;
  const v = live.data;
  const tz = v.event.timeZone;
  const free = v.fixers.filter((f) => !f.busy).length;

  return (
    <div>
      <Link to={paths.groupEvents(v.event.groupId)} className="text-sm font-bold text-navy underline">
        ← {t('desk.live.allSessions', { group: v.event.groupName })}
      </Link>
      <div className="mt-2">
        <PageTitle
          title={v.event.title}
          lead={
            <span className="font-bold text-copper-dark">
              {t('desk.live.lead', { day: formatDay(v.event.startsAt, tz, lang) })}
            </span>
          }
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
          {t('desk.live.openHall')} <span aria-hidden>↗</span>
          <span className="sr-only">{t('desk.live.newTab')}</span>
        </a>
        <Link
          to={paths.tags(eventId)}
          target="_blank"
          className={`${linkButton} bg-white text-navy ring-1 ring-navy/25 hover:bg-navy/5`}
        >
          {t('desk.printAll')}
        </Link>
        <p className="w-full text-sm text-ink-soft sm:ml-auto sm:w-auto" aria-live="polite">
          {t('desk.updated', { time: formatTime(new Date(live.dataUpdatedAt), tz, lang) })}
          {live.isFetching ? ` · ${t('desk.live.refreshing')}` : ''}
        </p>
      </div>

      {live.isError && (
        <div className="mb-4">
          <Alert tone="caution" title={t('desk.live.refreshFailed')}>
            {t('desk.live.stale', { time: formatTime(new Date(live.dataUpdatedAt), tz, lang) })} (
            {tr(live.error.message)})
          </Alert>
        </div>
      )}

      <section aria-label={t('desk.live.counts')} className="mb-5">
        <StatusTallies counts={v.counts} />
      </section>

      {v.warnings.length > 0 && (
        <div className="mb-5">
          <Alert tone="caution" title={t('desk.live.attention', { n: v.warnings.length })}>
            <ul className="list-disc space-y-0.5 pl-5">
              {v.warnings.map((w, i) => (
                <li key={`${w.kind}-${w.itemId ?? w.userId ?? i}`}>
                  {w.itemId ? (
                    <Link to={paths.item(w.itemId)} className="underline">
                      {t(`desk.live.warning.${w.kind}`, w.values)}
                    </Link>
                  ) : (
                    t(`desk.live.warning.${w.kind}`, w.values)
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
            <EmptyState title={t('desk.live.noBenches')} icon="▭">
              {trParts('desk.live.noBenchesBody', {
                benches: (
                  <Link to={paths.benches(eventId)} className="font-bold text-navy underline">
                    {t('desk.live.benches')}
                  </Link>
                ),
              })}
            </EmptyState>
          ) : (
            v.benches.map((b) => <BenchCard key={b.id} bench={b} tz={tz} />)
          )}

          <Card className="p-4 sm:p-5">
            <section aria-label={t('desk.live.unplaced')}>
              <h2 className="text-lg">
                {t('desk.live.unplaced')}{' '}
                <span className="text-sm font-semibold text-ink-soft">· {v.unplaced.length}</span>
              </h2>
              {v.unplaced.length === 0 ? (
                <p className="mt-1 text-sm text-ink-soft">{t('desk.live.allPlaced')}</p>
              ) : (
                <>
                  <p className="mb-2 text-sm text-ink-soft">
                    {trParts('desk.live.placeThem', {
                      board: (
                        <Link to={paths.board(eventId)} className="font-bold text-navy underline">
                          {t('desk.live.board')}
                        </Link>
                      ),
                    })}
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

        <aside aria-label={t('desk.live.onShift')} className="min-w-0">
          <Card className="p-4">
            <h2 className="text-lg">{t('desk.live.onShift')}</h2>
            <p className="mb-2 text-sm text-ink-soft">
              {v.fixers.length === 0
                ? t('desk.live.nobodyOnShift')
                : t('desk.live.busyFree', { busy: v.fixers.length - free, free })}
            </p>
            {v.fixers.length > 0 && (
              <ul className="divide-y divide-ink/5">
                {v.fixers.map((f) => (
                  <li key={f.userId} className="flex items-center justify-between gap-2 py-1.5 text-sm">
                    <span className="min-w-0 truncate font-semibold">{f.name}</span>
                    <span
                      className={`shrink-0 rounded-full px-2 py-0.5 text-xs font-bold ${f.busy ? 'bg-navy text-white' : 'bg-sage-light text-sage'}`}
                    >
                      {f.busy ? t('desk.live.busy') : t('desk.live.free')}
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
