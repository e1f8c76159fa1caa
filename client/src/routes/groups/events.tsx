import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay, formatTimeRange } from '../../../../shared/format';
import { GroupTabs } from '../../components/layouts/group-tabs';
import { Alert, EmptyState, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { useGroupEvents, groupEventsQuery } from '../../features/events/api/get-group-events';
import { useGroupSettings, groupSettingsQuery } from '../../features/groups/api/get-group-settings';
import { PlacesBar, StatusBadge } from '../../features/events/components/places-bar';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  Promise.all([
    queryClient.ensureQueryData(groupEventsQuery(Number(params.groupId))),
    queryClient.ensureQueryData(groupSettingsQuery(Number(params.groupId))),
  ]).catch(() => null);

export function GroupEventsPage() {
  const groupId = Number(useParams().groupId);
  const events = useGroupEvents(groupId);
  const group = useGroupSettings(groupId);
  return (
    <div>
      <div className="mb-2 flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl sm:text-3xl">{group.data?.name ?? 'Sessions'}</h1>
        <Link
          to={paths.newEvent(groupId)}
          className="inline-flex min-h-11 items-center rounded-lg bg-copper px-4 font-bold text-white hover:bg-copper-dark"
        >
          + New session
        </Link>
      </div>
      <GroupTabs groupId={groupId} />
      {events.isPending && <Spinner />}
      {events.error && <Alert tone="error">{events.error.message}</Alert>}
      {events.data?.length === 0 && (
        <EmptyState title="No sessions yet" icon="▦">
          Plan the first one: pick a date, the venue and the opening hours, and Mendery cuts the slots.
        </EmptyState>
      )}
      <ul className="space-y-3">
        {events.data?.map((e) => (
          <li key={e.id}>
            <Link
              to={paths.manageEvent(e.id)}
              className="grid gap-3 rounded-xl bg-white p-4 ring-1 ring-ink/5 hover:ring-copper sm:grid-cols-[1fr_14rem] sm:items-center"
            >
              <div>
                <div className="flex items-center gap-2">
                  <StatusBadge status={e.status} />
                  <span className="text-sm font-bold text-copper-dark">
                    {formatDay(e.startsAt, e.timeZone)} · {formatTimeRange(e.startsAt, e.endsAt, e.timeZone)}
                  </span>
                </div>
                <p className="mt-1 text-lg font-extrabold text-navy">{e.title}</p>
                <p className="text-sm text-ink-soft">{e.venue.name}</p>
              </div>
              <PlacesBar free={e.freePlaces} total={e.totalPlaces} />
            </Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
