import { useEffect, useState } from 'react';
import { formatTime } from '../../../../../shared/format';
import { ApiError } from '../../../lib/api';
import { useHallQueue } from '../api/get-hall-queue';
import type { HallQueue } from '../api/types';
import { followGroupLanguage, useLanguage, useT } from '../../../lib/i18n';

/** Waiting numbers that fit on the screen (three to a row) without scrolling; the rest are counted. */
function useWaitingRoom() {
  const rowsFor = (h: number) => (h >= 1000 ? 5 : h >= 800 ? 4 : 3);
  const [rows, setRows] = useState(() => rowsFor(window.innerHeight));
  useEffect(() => {
    const onResize = () => setRows(rowsFor(window.innerHeight));
    window.addEventListener('resize', onResize);
    return () => window.removeEventListener('resize', onResize);
  }, []);
  return rows * 3;
}

/** The product's name, the same in every language. */
const PRODUCT = 'Mendery';

const localTimeZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone;

/** The wall clock, ticking often enough that the minute changes on time. */
function useNow(intervalMs = 5_000) {
  const [now, setNow] = useState(() => new Date());
  useEffect(() => {
    const t = window.setInterval(() => setNow(new Date()), intervalMs);
    return () => window.clearInterval(t);
  }, [intervalMs]);
  return now;
}

/** "about 15 min", "up next", or "—" when nobody can say (no fixer on hand). */
function waitLabel(t: ReturnType<typeof useT>, minutes: number | null): string {
  if (minutes === null) return '—';
  if (minutes <= 0) return t('desk.hall.upNext');
  return t('desk.hall.about', { minutes });
}

const numberText = (n: number | null) => (n === null ? '—' : String(n));

/**
 * The hall's TV: queue numbers being served and at which bench, then the numbers waiting with an estimate.
 * No names. Refreshes itself; when a refresh fails it keeps showing the last answer with a quiet banner.
 */
export function HallDisplay({ eventId }: { eventId: number }) {
  const t = useT();
  const lang = useLanguage();
  const queue = useHallQueue(eventId);
  const now = useNow();
  const data = queue.data;
  const tz = data?.event.timeZone ?? localTimeZone();
  // The hall's screen speaks the group's language unless this browser has chosen one of ours.
  const groupLanguage = data?.event.groupLanguage;
  useEffect(() => followGroupLanguage(groupLanguage, () => undefined), [groupLanguage]);

  return (
    <div className="flex min-h-dvh flex-col bg-navy px-6 py-5 text-white antialiased lg:px-10 lg:py-8">
      <title>{t('desk.hall.pageTitle', { title: data?.event.title ?? 'Mendery' })}</title>
      <header className="flex items-start justify-between gap-6 border-b border-white/15 pb-4">
        <div className="min-w-0">
          <h1 className="truncate text-xl font-extrabold text-white lg:text-2xl 2xl:text-3xl">
            {data?.event.title ?? t('desk.hall.session')}
          </h1>
          {data && (
            <p className="truncate text-base font-semibold text-white/70 lg:text-lg 2xl:text-xl">
              {data.event.groupName}
            </p>
          )}
        </div>
        <p
          className="shrink-0 text-3xl font-extrabold tabular-nums lg:text-4xl 2xl:text-5xl"
          aria-label={t('desk.hall.timeNow')}
        >
          <time dateTime={now.toISOString()}>{formatTime(now, tz, lang)}</time>
        </p>
      </header>

      {queue.isError && data && (
        <p
          role="status"
          className="mt-3 rounded-lg bg-white/10 px-4 py-2 text-base font-semibold text-copper-light lg:text-lg"
        >
          {t('desk.hall.stale', { time: formatTime(new Date(queue.dataUpdatedAt), tz, lang) })}
        </p>
      )}

      {data ? (
        <Board data={data} />
      ) : queue.isError ? (
        <div role="alert" className="flex flex-1 flex-col items-center justify-center gap-3 text-center">
          <p className="text-4xl font-extrabold lg:text-5xl">{t('desk.hall.notShowing')}</p>
          <p className="max-w-2xl text-xl text-white/70 lg:text-2xl">
            {queue.error instanceof ApiError && queue.error.status === 404
              ? t('desk.hall.notPublished')
              : t('desk.hall.unreachable')}
          </p>
        </div>
      ) : (
        <div role="status" className="flex flex-1 items-center justify-center gap-4 text-2xl text-white/80 lg:text-3xl">
          <span className="size-8 animate-spin rounded-full border-4 border-white border-r-transparent" aria-hidden />
          {t('desk.hall.loading')}
        </div>
      )}

      <footer className="mt-4 flex flex-wrap items-center justify-between gap-x-6 gap-y-1 border-t border-white/15 pt-3 text-base text-white/70 lg:text-lg 2xl:text-xl">
        <p>
          {data
            ? `${t('desk.hall.doneToday', { n: data.done })} · ${t('desk.hall.fixersOnHand', { n: data.fixersOnHand })}`
            : PRODUCT}
        </p>
        {queue.dataUpdatedAt > 0 && (
          <p className="tabular-nums">
            {t('desk.updated', { time: formatTime(new Date(queue.dataUpdatedAt), tz, lang) })}
          </p>
        )}
      </footer>
    </div>
  );
}

function Board({ data }: { data: HallQueue }) {
  const t = useT();
  const room = useWaitingRoom();
  const waitingShown = data.waiting.slice(0, room);
  const more = data.waiting.length - waitingShown.length;
  return (
    <main className="mt-6 grid flex-1 content-start gap-8 lg:grid-cols-[3fr_2fr] lg:gap-10">
      <section aria-label={t('desk.hall.serving')} className="min-w-0">
        <h2 className="mb-4 text-3xl font-extrabold text-copper-light lg:text-4xl 2xl:text-5xl">
          {t('desk.hall.serving')}
        </h2>
        {data.serving.length === 0 ? (
          <p className="rounded-2xl border-2 border-dashed border-white/20 px-6 py-10 text-center text-2xl text-white/75 lg:text-3xl">
            {t('desk.hall.noneServing')}
          </p>
        ) : (
          <ol data-testid="serving" className="grid grid-cols-2 gap-4 md:grid-cols-3 2xl:grid-cols-4">
            {data.serving.map((s, i) => (
              <li
                key={`${s.queueNumber ?? 'x'}-${i}`}
                className="flex min-w-0 flex-col items-center justify-center rounded-2xl bg-white/10 px-3 py-4 text-center ring-1 ring-white/10"
              >
                <span
                  data-testid="queue-number"
                  className="text-6xl leading-none font-extrabold tabular-nums lg:text-8xl 2xl:text-9xl"
                >
                  {numberText(s.queueNumber)}
                </span>
                <span className="mt-2 max-w-full break-words text-center text-xl leading-tight font-bold text-copper-light lg:text-2xl 2xl:text-3xl">
                  {s.benchName ?? t('desk.hall.atABench')}
                </span>
              </li>
            ))}
          </ol>
        )}
      </section>

      <section aria-label={t('desk.hall.waiting')} className="min-w-0">
        <h2 className="mb-4 text-3xl font-extrabold text-copper-light lg:text-4xl 2xl:text-5xl">
          {t('desk.hall.waiting')}
          {data.waiting.length > 0 && (
            <span className="ml-3 text-xl font-bold text-white/60 lg:text-2xl">{data.waiting.length}</span>
          )}
        </h2>
        {data.waiting.length === 0 ? (
          <p className="rounded-2xl border-2 border-dashed border-white/20 px-6 py-10 text-center text-2xl text-white/75 lg:text-3xl">
            {t('desk.hall.noneWaiting')}
          </p>
        ) : (
          <>
            <ol data-testid="waiting" className="grid grid-cols-2 gap-3 sm:grid-cols-3">
              {waitingShown.map((w, i) => (
                <li
                  key={`${w.queueNumber ?? 'x'}-${i}`}
                  className={`flex min-w-0 flex-col items-center rounded-xl px-2 py-3 text-center ${i === 0 ? 'bg-sage/60 ring-1 ring-sage-light/40' : 'bg-white/5'}`}
                >
                  <span
                    data-testid="queue-number"
                    className="text-6xl leading-none font-extrabold tabular-nums 2xl:text-7xl"
                  >
                    {numberText(w.queueNumber)}
                  </span>
                  <span className="mt-1 text-lg font-semibold text-white/80 lg:text-xl 2xl:text-2xl">
                    {waitLabel(t, w.waitMinutes)}
                  </span>
                </li>
              ))}
            </ol>
            {more > 0 && (
              <p className="mt-3 text-xl font-semibold text-white/70 lg:text-2xl">{t('desk.hall.more', { n: more })}</p>
            )}
          </>
        )}
      </section>
    </main>
  );
}
