import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay, formatTime } from '../../../../shared/format';
import { EventTabs } from '../../components/layouts/event-tabs';
import { Alert } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { triageRunQuery, useTriageRun } from '../../features/triage/api/get-triage-run';
import { TriageRunSummary } from '../../features/triage/components/triage-run-summary';
import { queryClient } from '../../lib/query-client';

/** The page reads what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(triageRunQuery(Number(params.eventId), Number(params.runId)));

/** One earlier triage run in words: what went in and what came out; the stored data only under "Technical details". */
export function TriageRunPage() {
  const p = useParams();
  const eventId = Number(p.eventId);
  const { data: d } = useTriageRun(eventId, Number(p.runId));
  const tz = d.event.timeZone;
  return (
    <div>
      <Link to={paths.board(eventId)} className="text-sm font-bold text-navy underline">
        ← Back to the triage board
      </Link>
      <h1 className="mt-2 text-2xl sm:text-3xl">{d.event.title}</h1>
      <p className="mb-3 font-bold text-copper-dark">{formatDay(d.event.startsAt, tz)}</p>
      <EventTabs eventId={eventId} />
      <h2 className="text-2xl">Triage run at {formatTime(d.run.createdAt, tz)}</h2>
      <p className="mb-4 text-ink-soft">
        Run on {formatDay(d.run.createdAt, tz)} for{' '}
        {d.run.slotStartsAt ? `the slot at ${formatTime(d.run.slotStartsAt, tz)}` : 'the whole session, slot by slot'}.
        The board may have changed since: this page shows the run as it was.
      </p>
      {d.summary ? (
        <TriageRunSummary summary={d.summary} timeZone={tz} />
      ) : (
        <Alert tone="caution" title="This run cannot be summarised">
          It was stored in an older form; its data is under “Technical details”.
        </Alert>
      )}
      <details className="mt-6 rounded-xl bg-white p-4 ring-1 ring-ink/5">
        <summary className="cursor-pointer font-bold text-navy">Technical details (the run’s stored data)</summary>
        <p className="mt-2 text-sm text-ink-soft">
          Exactly what the matching engine was given and gave back, for checking or reporting a problem.
        </p>
        <pre className="mt-2 max-h-96 overflow-auto rounded bg-ink/5 p-3 text-xs" tabIndex={0} aria-label="Stored data">
          {JSON.stringify(d.technical, null, 2)}
        </pre>
      </details>
    </div>
  );
}
