import { useParams, type LoaderFunctionArgs } from 'react-router';
import { tagSheetQuery } from '../../features/event-day/api/get-tag-sheet';
import { sheetFilterOf, TagSheet } from '../../features/event-day/components/tag-sheet';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params, request }: LoaderFunctionArgs) => {
  const search = new URL(request.url).searchParams;
  return queryClient
    .ensureQueryData(tagSheetQuery(Number(params.eventId), sheetFilterOf(search.get('slot'), search.get('items'))))
    .catch(() => null);
};

/** Printable intake tags for a slot, some items, or every checked-in item of the event. */
export function TagSheetPage() {
  return <TagSheet eventId={Number(useParams().eventId)} />;
}
