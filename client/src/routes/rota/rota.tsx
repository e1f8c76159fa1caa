import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay, formatTimeRange } from '../../../../shared/format';
import { EventTabs } from '../../components/layouts/event-tabs';
import { SessionHeading } from '../../components/layouts/session-heading';
import { paths } from '../../config/paths';
import { eventBenchesQuery, useEventBenches } from '../../features/benches/api/get-event-benches';
import { eventQuery } from '../../features/events/api/get-event';
import { rotaQuery, useRota } from '../../features/rota/api/get-rota';
import { RotaGaps } from '../../features/rota/components/rota-gaps';
import { ShiftTable } from '../../features/rota/components/shift-table';
import { SkillCoverChart } from '../../features/rota/components/skill-cover-chart';
import { useRefreshBoard } from '../../features/triage/api/get-board';
import { queryClient } from '../../lib/query-client';
import { useLanguage, useT } from '../../lib/i18n';

/** The page reads what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. */
export const loader = ({ params }: LoaderFunctionArgs) => {
  const eventId = Number(params.eventId);
  return Promise.all([
    queryClient.ensureQueryData(eventQuery(eventId)),
    queryClient.ensureQueryData(rotaQuery(eventId)),
    queryClient.ensureQueryData(eventBenchesQuery(eventId)),
  ]);
};

/** Who comes when, as a chart of skills × slots: green where covered, red where items wait for a skill nobody has. */
export function RotaPage() {
  const t = useT();
  const lang = useLanguage();
  const id = Number(useParams().eventId);
  const { data: event } = useSuspenseQuery(eventQuery(id));
  const { data: rota } = useRota(id);
  const { data: benches } = useEventBenches(id);
  const refreshBoard = useRefreshBoard(id);
  const tz = event.timeZone;
  return (
    <div>
      <SessionHeading
        back={{ to: paths.groupEvents(event.groupId), label: t('organise.allSessions', { group: event.groupName }) }}
        title={event.title}
        when={t('organise.rota.when', {
          day: formatDay(event.startsAt, tz, lang),
          time: formatTimeRange(event.startsAt, event.endsAt, tz, lang),
        })}
      />
      <EventTabs eventId={id} />
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <SkillCoverChart rota={rota} timeZone={tz} />
        <RotaGaps eventId={id} gaps={rota.gaps} timeZone={tz} />
      </div>
      <h2 className="mb-2 mt-6 text-xl">{t('organise.rota.whoIsComing')}</h2>
      <ShiftTable eventId={id} shifts={rota.shifts} benches={benches} timeZone={tz} onSeated={refreshBoard} />
    </div>
  );
}
