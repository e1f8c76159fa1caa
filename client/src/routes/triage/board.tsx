import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay } from '../../../../shared/format';
import { EventTabs } from '../../components/layouts/event-tabs';
import { Alert } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { boardQuery, useBoard } from '../../features/triage/api/get-board';
import { BenchColumns } from '../../features/triage/components/bench-columns';
import { TriageRunBar } from '../../features/triage/components/triage-run-bar';
import { TriageRunHistory } from '../../features/triage/components/triage-run-history';
import { useLanguage, useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';

/** The page reads what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(boardQuery(Number(params.eventId)));

/** Columns per bench, each with its fixers' item cards; one column of items still waiting, with the reason. */
export function TriageBoardPage() {
  const t = useT();
  const lang = useLanguage();
  const id = Number(useParams().eventId);
  const { data: b } = useBoard(id);
  return (
    <div>
      <Link to={paths.groupEvents(b.event.groupId)} className="text-sm font-bold text-navy underline">
        ← {t('organise.triage.board.back', { group: b.event.groupName })}
      </Link>
      <h1 className="mt-2 text-2xl sm:text-3xl">{b.event.title}</h1>
      <p className="mb-3 font-bold text-copper-dark">{formatDay(b.event.startsAt, b.event.timeZone, lang)}</p>
      <EventTabs eventId={id} />
      <TriageRunBar board={b} />
      {b.benches.length === 0 && (
        <Alert tone="caution" title={t('organise.triage.board.noBenchesTitle')}>
          {t('organise.triage.board.noBenches')}
        </Alert>
      )}
      {b.fixers.length === 0 && (
        <Alert tone="caution" title={t('organise.triage.board.noFixersTitle')}>
          {t('organise.triage.board.noFixers')}
        </Alert>
      )}
      <BenchColumns board={b} />
      <TriageRunHistory board={b} />
    </div>
  );
}
