import { Link } from 'react-router';
import type { EventSummary } from '../../../../../shared/api/events';
import type { SessionFigures } from '../../../../../shared/api/impact';
import { formatDay, formatTimeRange, intlLocale } from '../../../../../shared/format';
import type { Language } from '../../../../../shared/i18n/languages';
import { paths } from '../../../config/paths';
import { useLanguage, useT } from '../../../lib/i18n';
import { PlacesBar, StatusBadge } from './places-bar';

const when = (e: EventSummary, lang: Language) =>
  `${formatDay(e.startsAt, e.timeZone, lang)} · ${formatTimeRange(e.startsAt, e.endsAt, e.timeZone, lang)}`;

/** A session still to come (or running today): its state, date and free places. */
export function ComingRow({ e, today }: { e: EventSummary; today: boolean }) {
  const t = useT();
  const lang = useLanguage();
  return (
    <Link
      to={paths.manageEvent(e.id)}
      className={`grid gap-3 rounded-xl bg-white p-4 ring-1 hover:ring-copper sm:grid-cols-[1fr_14rem] sm:items-center ${today ? 'ring-2 ring-copper' : 'ring-ink/5'}`}
    >
      <div>
        <div className="flex flex-wrap items-center gap-2">
          {today && (
            <span className="rounded-full bg-copper px-2.5 py-0.5 text-xs font-extrabold text-white">
              {t('organise.row.today')}
            </span>
          )}
          <StatusBadge status={e.status} />
          <span className="text-sm font-bold text-copper-dark">{when(e, lang)}</span>
        </div>
        <p className="mt-1 text-lg font-extrabold text-navy">{e.title}</p>
        <p className="text-sm text-ink-soft">{e.venue.name}</p>
      </div>
      {e.status === 'cancelled' ? (
        <p className="text-sm font-semibold text-ink-soft">{t('organise.row.calledOffTold')}</p>
      ) : (
        <PlacesBar free={e.freePlaces} total={e.totalPlaces} />
      )}
    </Link>
  );
}

/** What a past session came to, in words; nothing to say while the figures load or for roles that do not see them. */
function Outcomes({ e, figures }: { e: EventSummary; figures: SessionFigures | null | undefined }) {
  const t = useT();
  const lang = useLanguage();
  if (e.status === 'cancelled') return <p className="text-sm text-ink-soft">{t('organise.row.calledOffNoFigures')}</p>;
  if (figures === undefined) return null;
  if (figures === null || figures.items === 0)
    return <p className="text-sm text-ink-soft">{t('organise.row.noItems')}</p>;
  const parts = [
    [figures.fixed, 'fixed'],
    [figures.partsNeeded, 'partsNeeded'],
    [figures.advice, 'advice'],
    [figures.endOfLife, 'endOfLife'],
    [figures.unknown, 'unknown'],
  ] as const;
  return (
    <dl className="flex flex-wrap gap-x-4 gap-y-1 text-sm" aria-label={t('organise.row.outcomes')}>
      <div className="flex gap-1">
        <dt className="sr-only">{t('organise.row.itemsSeenLabel')}</dt>
        <dd className="font-extrabold text-navy">{t('organise.row.itemsSeen', { n: figures.items })}</dd>
      </div>
      {parts
        .filter(([n]) => n > 0)
        .map(([n, key]) => (
          <div key={key} className="flex gap-1">
            <dt className="sr-only">{t(`organise.row.outcome.${key}`)}</dt>
            <dd>
              <span className="font-bold">{n}</span> {t(`organise.row.outcome.${key}`)}
            </dd>
          </div>
        ))}
      <div className="flex gap-1">
        <dt className="sr-only">{t('organise.row.keptLabel')}</dt>
        <dd>
          <span className="font-bold">
            {t('organise.row.kg', {
              kg: new Intl.NumberFormat(intlLocale(lang), { maximumFractionDigits: 1 }).format(figures.kgDiverted),
            })}
          </span>{' '}
          {t('organise.row.kept')}
        </dd>
      </div>
    </dl>
  );
}

/** A session that is over: its date and what came of it, with the way to its report. */
export function PastRow({ e, figures }: { e: EventSummary; figures: SessionFigures | null | undefined }) {
  const t = useT();
  const lang = useLanguage();
  return (
    <div className="grid gap-2 rounded-xl bg-white/70 p-4 ring-1 ring-ink/5 sm:grid-cols-[1fr_auto] sm:items-center">
      <div>
        <p className="text-sm font-bold text-ink-soft">
          {when(e, lang)} · {e.venue.name}
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
          {t('organise.row.report')}
          <span className="sr-only">
            {' '}
            {t('organise.row.reportFor', { day: formatDay(e.startsAt, e.timeZone, lang) })}
          </span>
        </Link>
      )}
    </div>
  );
}
