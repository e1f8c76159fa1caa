import { useParams, type LoaderFunctionArgs } from 'react-router';
import { formatTimeRange } from '../../../../shared/format';
import { EventTabs } from '../../components/layouts/event-tabs';
import { Alert, Spinner } from '../../components/ui/feedback';
import { eventBenchesQuery, useEventBenches } from '../../features/benches/api/get-event-benches';
import { useEvent } from '../../features/events/api/get-event';
import { rotaQuery, useRota } from '../../features/rota/api/get-rota';
import { RotaGaps } from '../../features/rota/components/rota-gaps';
import { ShiftTable } from '../../features/rota/components/shift-table';
import { SkillCoverChart } from '../../features/rota/components/skill-cover-chart';
import { useRefreshBoard } from '../../features/triage/api/get-board';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) => {
  const eventId = Number(params.eventId);
  return Promise.all([
    queryClient.ensureQueryData(rotaQuery(eventId)),
    queryClient.ensureQueryData(eventBenchesQuery(eventId)),
  ]).catch(() => null);
};

/** Who comes when, as a chart of skills × slots: green where covered, red where items wait for a skill nobody has. */
export function RotaPage() {
  const id = Number(useParams().eventId);
  const event = useEvent(id);
  const rota = useRota(id);
  const benches = useEventBenches(id);
  const refreshBoard = useRefreshBoard(id);
  if (rota.isPending || event.isPending) return <Spinner label="Loading the rota…" />;
  if (rota.error) return <Alert tone="error">{rota.error.message}</Alert>;
  if (event.error) return <Alert tone="error">{event.error.message}</Alert>;
  const tz = event.data.timeZone;
  return (
    <div>
      <h1 className="text-2xl sm:text-3xl">{event.data.title}</h1>
      <p className="mb-3 font-bold text-copper-dark">
        Rota · {formatTimeRange(event.data.startsAt, event.data.endsAt, tz)}
      </p>
      <EventTabs eventId={id} />
      <div className="grid gap-4 lg:grid-cols-[1fr_20rem]">
        <SkillCoverChart rota={rota.data} timeZone={tz} />
        <RotaGaps eventId={id} gaps={rota.data.gaps} timeZone={tz} />
      </div>
      <h2 className="mb-2 mt-6 text-xl">Who is coming</h2>
      <ShiftTable
        eventId={id}
        shifts={rota.data.shifts}
        benches={benches.data ?? []}
        timeZone={tz}
        onSeated={refreshBoard}
      />
    </div>
  );
}
