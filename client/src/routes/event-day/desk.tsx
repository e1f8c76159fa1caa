import { useQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { categoriesQuery, useCategories } from '../../features/categories/api/get-categories';
import { eventQuery } from '../../features/events/api/get-event';
import { deskQuery, useDesk } from '../../features/event-day/api/get-desk';
import { deskEventsQuery, useDeskEvents } from '../../features/event-day/api/get-desk-events';
import { DeskBoard } from '../../features/event-day/components/desk-board';
import { DeskHome } from '../../features/event-day/components/desk-home';
import { queryClient } from '../../lib/query-client';

/**
 * The pages read what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. The
 * event (for the group's excluded kinds) is fetched alongside but may fail: the server screens every walk-in too.
 */
export const loader = async ({ params }: LoaderFunctionArgs) => {
  if (!params.eventId) return queryClient.ensureQueryData(deskEventsQuery());
  const eventId = Number(params.eventId);
  void queryClient.prefetchQuery(eventQuery(eventId));
  return Promise.all([queryClient.ensureQueryData(deskQuery(eventId)), queryClient.ensureQueryData(categoriesQuery())]);
};

/** /desk: the sessions reception can open, today's first. */
export function DeskHomePage() {
  return <DeskHome events={useDeskEvents().data} />;
}

/**
 * /desk/:eventId: today's bookings by slot, search, scan, check-in item by item, walk-ins. The walk-in form and a
 * corrected kind are screened as a booking is: with the kinds of item and the group's excluded ones.
 */
export function DeskPage() {
  const eventId = Number(useParams().eventId);
  const { data: desk } = useDesk(eventId);
  const { data: categories } = useCategories();
  const event = useQuery(eventQuery(eventId));
  return (
    <DeskBoard
      desk={desk}
      screening={{
        categories,
        groupName: desk.event.groupName,
        excludedCategoryIds: event.data?.excludedCategoryIds ?? [],
      }}
    />
  );
}
