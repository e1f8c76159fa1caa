import { useParams, type LoaderFunctionArgs } from 'react-router';
import { hallQueueQuery } from '../../features/event-day/api/get-hall-queue';
import { HallDisplay } from '../../features/event-day/components/hall-display';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(hallQueueQuery(Number(params.eventId))).catch(() => null);

/** The hall's TV: queue numbers only, no names; it refreshes itself. */
export function HallDisplayPage() {
  return <HallDisplay eventId={Number(useParams().eventId)} />;
}
