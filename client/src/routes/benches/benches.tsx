import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay, formatTimeRange } from '../../../../shared/format';
import { EventTabs } from '../../components/layouts/event-tabs';
import { SessionHeading } from '../../components/layouts/session-heading';
import { paths } from '../../config/paths';
import { eventBenchesQuery, useEventBenches } from '../../features/benches/api/get-event-benches';
import { BenchLayoutEditor } from '../../features/benches/components/bench-layout-editor';
import { eventQuery } from '../../features/events/api/get-event';
import { useRefreshBoard } from '../../features/triage/api/get-board';
import { queryClient } from '../../lib/query-client';
import { useLanguage, useT } from '../../lib/i18n';

/** The page reads what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. */
export const loader = ({ params }: LoaderFunctionArgs) => {
  const eventId = Number(params.eventId);
  return Promise.all([
    queryClient.ensureQueryData(eventQuery(eventId)),
    queryClient.ensureQueryData(eventBenchesQuery(eventId)),
  ]);
};

/** This session's benches, copied from the venue's usual layout the first time; changes stay with the session. */
export function BenchesPage() {
  const t = useT();
  const lang = useLanguage();
  const id = Number(useParams().eventId);
  const { data: event } = useSuspenseQuery(eventQuery(id));
  const { data: benches } = useEventBenches(id);
  const refreshBoard = useRefreshBoard(id);
  return (
    <div>
      <SessionHeading
        back={{ to: paths.groupEvents(event.groupId), label: t('organise.allSessions', { group: event.groupName }) }}
        title={event.title}
        when={t('organise.benches.when', {
          day: formatDay(event.startsAt, event.timeZone, lang),
          time: formatTimeRange(event.startsAt, event.endsAt, event.timeZone, lang),
        })}
      />
      <EventTabs eventId={id} />
      <BenchLayoutEditor eventId={id} saved={benches} venue={event.venue} onChanged={refreshBoard} />
    </div>
  );
}
