import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { formatTime } from '../../../../../shared/format';
import { Card } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import type { LiveCard, LiveView } from '../api/types';
import { useLanguage, useT } from '../../../lib/i18n';

/** One bench on the live view: the item at it, the ones waiting for it and the ones done. */
export function BenchCard({ bench, tz }: { bench: LiveView['benches'][number]; tz: string }) {
  const t = useT();
  const lang = useLanguage();
  return (
    <Card className="p-4 sm:p-5">
      <section aria-label={bench.name}>
        <header className="mb-3 flex flex-wrap items-baseline justify-between gap-x-3">
          <h2 className="text-lg">{bench.name}</h2>
          <p className="text-sm text-ink-soft">
            {t('desk.live.benchCounts', {
              atBench: bench.atBench.length,
              waiting: bench.waiting.length,
              done: bench.done.length,
            })}
          </p>
        </header>
        <div className="grid gap-4 md:grid-cols-3">
          <Column title={t('fixer.status.at-bench')} count={bench.atBench.length} empty={t('desk.live.nothingInHand')}>
            {bench.atBench.map((c) => (
              <li key={c.id}>
                <ItemLink card={c} tone="active">
                  <p className="text-xs text-ink-soft">
                    {c.fixerName ?? t('desk.live.noFixer')}
                    {c.startedAt ? ` · ${t('desk.live.started', { time: formatTime(c.startedAt, tz, lang) })}` : ''}
                  </p>
                </ItemLink>
              </li>
            ))}
          </Column>
          <Column title={t('fixer.status.waiting')} count={bench.waiting.length} empty={t('desk.live.noneWaiting')}>
            {bench.waiting.map((c) => (
              <li key={c.id}>
                <ItemLink card={c}>
                  <WaitLine card={c} />
                </ItemLink>
              </li>
            ))}
          </Column>
          <Column title={t('fixer.status.done')} count={bench.done.length} empty={t('desk.live.noneYet')}>
            {bench.done.map((c) => (
              <li key={c.id}>
                <ItemLink card={c} tone="done">
                  <p className="text-xs font-semibold text-sage">
                    {c.outcomeLabel ?? t('fixer.status.done')}
                    {c.doneAt ? (
                      <span className="font-normal text-ink-soft"> · {formatTime(c.doneAt, tz, lang)}</span>
                    ) : null}
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

export function WaitLine({ card }: { card: LiveCard }) {
  const t = useT();
  const m = card.estimatedWaitMinutes;
  return (
    <p className="text-xs text-ink-soft">
      {card.waitedMinutes !== null
        ? t('desk.live.waited', { minutes: card.waitedMinutes })
        : t('desk.live.notCheckedIn')}{' '}
      ·{' '}
      {m === null
        ? t('desk.live.estimateUnknown')
        : m <= 0
          ? t('desk.live.estimateNext')
          : t('desk.live.estimate', { minutes: m })}
    </p>
  );
}

export function ItemLink({ card, tone, children }: { card: LiveCard; tone?: 'active' | 'done'; children: ReactNode }) {
  const t = useT();
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
        <span className="shrink-0 font-extrabold text-navy tabular-nums">
          {t('desk.queueNo', { number: card.queueNumber ?? '—' })}
        </span>
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
