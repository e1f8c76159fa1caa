import { useParams, type LoaderFunctionArgs } from 'react-router';
import { liveViewQuery } from '../../features/event-day/api/get-live-view';
import { LiveViewBody } from '../../features/event-day/components/live-view';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(liveViewQuery(Number(params.eventId))).catch(() => null);

/** The organiser's view of the day as it happens: counts, warnings, each bench's items, and who is free. */
export function LiveViewPage() {
  return <LiveViewBody eventId={Number(useParams().eventId)} />;
}
