import { useParams, type LoaderFunctionArgs } from 'react-router';
import { EventTabs } from '../../components/layouts/event-tabs';
import { Alert, Spinner } from '../../components/ui/feedback';
import { eventBenchesQuery, useEventBenches } from '../../features/benches/api/get-event-benches';
import { BenchLayoutEditor } from '../../features/benches/components/bench-layout-editor';
import { useEvent } from '../../features/events/api/get-event';
import { useRefreshBoard } from '../../features/triage/api/get-board';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(eventBenchesQuery(Number(params.eventId))).catch(() => null);

/** This session's benches, copied from the venue's usual layout the first time; changes stay with the session. */
export function BenchesPage() {
  const id = Number(useParams().eventId);
  const event = useEvent(id);
  const benches = useEventBenches(id);
  const refreshBoard = useRefreshBoard(id);
  if (benches.isPending || event.isPending) return <Spinner />;
  if (benches.error) return <Alert tone="error">{benches.error.message}</Alert>;
  return (
    <div>
      <h1 className="text-2xl sm:text-3xl">{event.data?.title}</h1>
      <p className="mb-3 font-bold text-copper-dark">Benches</p>
      <EventTabs eventId={id} />
      <BenchLayoutEditor eventId={id} saved={benches.data} venue={event.data?.venue} onChanged={refreshBoard} />
    </div>
  );
}
