import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay, formatTime } from '../../../../shared/format';
import { EventTabs } from '../../components/layouts/event-tabs';
import { Alert } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { triageRunQuery, useTriageRun } from '../../features/triage/api/get-triage-run';
import { TriageRunSummary } from '../../features/triage/components/triage-run-summary';
import { useLanguage, useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';

/** The page reads what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(triageRunQuery(Number(params.eventId), Number(params.runId)));

/** One earlier triage run in words: what went in and what came out; the stored data only under "Technical details". */
export function TriageRunPage() {
  const t = useT();
  const lang = useLanguage();
  const p = useParams();
  const eventId = Number(p.eventId);
  const { data: d } = useTriageRun(eventId, Number(p.runId));
  const tz = d.event.timeZone;
  return (
    <div>
      <Link to={paths.board(eventId)} className="text-sm font-bold text-navy underline">
        ← {t('organise.triage.run.back')}
      </Link>
      <h1 className="mt-2 text-2xl sm:text-3xl">{d.event.title}</h1>
      <p className="mb-3 font-bold text-copper-dark">{formatDay(d.event.startsAt, tz, lang)}</p>
      <EventTabs eventId={eventId} />
      <h2 className="text-2xl">{t('organise.triage.run.title', { time: formatTime(d.run.createdAt, tz, lang) })}</h2>
      <p className="mb-4 text-ink-soft">
        {d.run.slotStartsAt
          ? t('organise.triage.run.forSlot', {
              day: formatDay(d.run.createdAt, tz, lang),
              time: formatTime(d.run.slotStartsAt, tz, lang),
            })
          : t('organise.triage.run.forSession', { day: formatDay(d.run.createdAt, tz, lang) })}
      </p>
      {d.summary ? (
        <TriageRunSummary summary={d.summary} timeZone={tz} />
      ) : (
        <Alert tone="caution" title={t('organise.triage.run.oldTitle')}>
          {t('organise.triage.run.old')}
        </Alert>
      )}
      <details className="mt-6 rounded-xl bg-white p-4 ring-1 ring-ink/5">
        <summary className="cursor-pointer font-bold text-navy">{t('organise.triage.run.technical')}</summary>
        <p className="mt-2 text-sm text-ink-soft">{t('organise.triage.run.technicalHint')}</p>
        <pre
          className="mt-2 max-h-96 overflow-auto rounded bg-ink/5 p-3 text-xs"
          tabIndex={0}
          aria-label={t('organise.triage.run.storedData')}
        >
          {JSON.stringify(d.technical, null, 2)}
        </pre>
      </details>
    </div>
  );
}
