import { useQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert, Spinner } from '../../components/ui/feedback';
import { categoriesQuery } from '../../features/categories/api/get-categories';
import { eventQuery } from '../../features/events/api/get-event';
import { deskQuery, useDesk } from '../../features/event-day/api/get-desk';
import { deskEventsQuery, useDeskEvents } from '../../features/event-day/api/get-desk-events';
import { DeskBoard } from '../../features/event-day/components/desk-board';
import { DeskHome } from '../../features/event-day/components/desk-home';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) => {
  if (!params.eventId) return queryClient.ensureQueryData(deskEventsQuery()).catch(() => null);
  const eventId = Number(params.eventId);
  return Promise.all([
    queryClient.ensureQueryData(deskQuery(eventId)),
    queryClient.ensureQueryData(eventQuery(eventId)),
    queryClient.ensureQueryData(categoriesQuery()),
  ]).catch(() => null);
};

/** /desk: the sessions reception can open, today's first. */
export function DeskHomePage() {
  const { data, isPending, error } = useDeskEvents();
  if (isPending) return <Spinner />;
  if (error) return <Alert tone="error">{error.message}</Alert>;
  return <DeskHome events={data} />;
}

/**
 * /desk/:eventId: today's bookings by slot, search, scan, check-in item by item, walk-ins. The walk-in form and a
 * corrected kind are screened as a booking is: with the kinds of item and the group's excluded ones.
 */
export function DeskPage() {
  const eventId = Number(useParams().eventId);
  const desk = useDesk(eventId);
  const event = useQuery(eventQuery(eventId));
  const categories = useQuery(categoriesQuery());
  if (desk.isPending || categories.isPending || event.isPending) return <Spinner label="Loading today’s bookings…" />;
  const error = desk.error ?? categories.error;
  if (error || !desk.data || !categories.data)
    return <Alert tone="error">{error?.message ?? 'The desk could not be loaded.'}</Alert>;
  // The server screens every walk-in too; without the event's exclusions the form still asks the hazard questions.
  return (
    <DeskBoard
      desk={desk.data}
      screening={{
        categories: categories.data,
        groupName: desk.data.event.groupName,
        excludedCategoryIds: event.data?.excludedCategoryIds ?? [],
      }}
    />
  );
}
