import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { ItemStatus } from '../../../../../shared/event-day/constants';
import { queueDays } from '../../../../../shared/event-day/queue-days';
import { formatTime } from '../../../../../shared/format';
import { EmptyState } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useQueue } from '../api/get-queue';
import { photoUrl } from '../api/photo-url';
import type { QueueItem } from '../api/types';
import { useLanguage, useT } from '../../../lib/i18n';

/**
 * The items coming to the fixer, by day in the group's time zone: today first, then the days to come, then items
 * left open from past days, apart. `statusChip` shows an item's status once it has arrived.
 */
export function QueueList({ statusChip }: { statusChip: (status: ItemStatus) => ReactNode }) {
  const t = useT();
  const lang = useLanguage();
  const { data: queue } = useQueue();
  const now = new Date();
  const days = queueDays(queue, now, lang);
  const coming = days.filter((d) => d.kind !== 'past');
  const past = days.filter((d) => d.kind === 'past');
  const day = (d: (typeof days)[number]) => (
    <section key={d.date} aria-labelledby={`queue-${d.date}`} className="space-y-3" data-testid="queue-day">
      <h3 id={`queue-${d.date}`} className="text-lg text-copper-dark">
        {d.kind === 'today' ? t('bench.queue.today', { day: d.label }) : d.label}
      </h3>
      <ol className="space-y-3">
        {d.items.map((q) => (
          <QueueCard
            key={q.itemId}
            q={q}
            late={d.kind === 'today' && new Date(q.slotStartsAt) < now}
            statusChip={statusChip}
          />
        ))}
      </ol>
    </section>
  );
  return (
    <section aria-labelledby="queue" className="space-y-4">
      <h2 id="queue" className="text-xl">
        {t('bench.queue.title')}
      </h2>
      {coming.length === 0 && (
        <EmptyState title={t('bench.queue.emptyTitle')} icon="⚒">
          {t('bench.queue.empty')}
        </EmptyState>
      )}
      {coming.map(day)}
      {past.length > 0 && (
        <section aria-labelledby="queue-past" className="space-y-3 border-t border-ink/10 pt-4">
          <h3 id="queue-past" className="text-lg">
            {t('bench.queue.pastTitle')}
          </h3>
          <p className="text-sm text-ink-soft">{t('bench.queue.past')}</p>
          {past.map(day)}
        </section>
      )}
    </section>
  );
}

function QueueCard({
  q,
  late,
  statusChip,
}: {
  q: QueueItem;
  late: boolean;
  statusChip: (status: ItemStatus) => ReactNode;
}) {
  const t = useT();
  const lang = useLanguage();
  const time = formatTime(q.slotStartsAt, q.timeZone, lang);
  return (
    <li className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-ink/5">
      <div className="flex items-baseline justify-between gap-2">
        <p className="text-lg font-extrabold text-navy">
          <Link
            to={paths.item(q.itemId)}
            className="underline decoration-copper/40 underline-offset-4 hover:decoration-copper"
          >
            {q.categoryName}
          </Link>
        </p>
        <p className="text-sm font-bold text-copper-dark">
          {/* A time already gone says so: "planned 07:52" an hour later reads as a mistake. */}
          {late ? t('bench.queue.dueSince', { time }) : t('bench.queue.planned', { time })}
        </p>
      </div>
      {q.status !== 'booked' && (
        <p className="mt-1 flex items-center gap-2">
          {statusChip(q.status)}
          {q.queueNumber !== null && <b>{t('bench.queue.no', { n: q.queueNumber })}</b>}
          {q.tagCode && <span className="font-mono text-sm">{q.tagCode}</span>}
        </p>
      )}
      <p className="mt-1">{q.fault}</p>
      <p className="mt-1 text-sm text-ink-soft">
        {[q.brand, q.model].filter(Boolean).join(' ') || t('bench.queue.noBrand')} · {q.visitorName} · {q.benchName} ·{' '}
        {t('bench.queue.about', { minutes: q.minutes })} · {q.reference}
      </p>
      {q.mains && (
        <p className="mt-2 rounded bg-copper-light px-2 py-1 text-sm font-semibold text-copper-dark">
          {t('bench.queue.mains')}
        </p>
      )}
      {q.photoIds.length > 0 && (
        <div className="mt-2 flex gap-2">
          {q.photoIds.map((p) => (
            <a key={p} href={photoUrl(p)} target="_blank" rel="noreferrer">
              <img
                src={photoUrl(p)}
                alt={t('bench.queue.photoOf', { kind: lang === 'de' ? q.categoryName : q.categoryName.toLowerCase() })}
                className="size-24 rounded-lg object-cover"
              />
            </a>
          ))}
        </div>
      )}
      <p className="mt-1 text-xs text-ink-soft">{q.eventTitle}</p>
    </li>
  );
}
