import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { slotHasPassed } from '../../../../shared/booking/bookability';
import { SKILL_LABELS } from '../../../../shared/constants';
import { formatDay, formatTime, formatTimeRange, WHAT_TO_BRING } from '../../../../shared/format';
import { Alert, Card, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { useUser } from '../../lib/auth';
import { useCategoriesQuery, categoriesQuery } from '../../features/categories/api/get-categories';
import { useEvent, eventQuery } from '../../features/events/api/get-event';
import { PlacesBar, StatusBadge } from '../../features/events/components/places-bar';
import { SessionMissing } from '../../features/events/components/session-missing';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  Promise.all([
    queryClient.ensureQueryData(eventQuery(Number(params.eventId))),
    queryClient.ensureQueryData(categoriesQuery()),
  ]).catch(() => null);

export function EventPage() {
  const id = Number(useParams().eventId);
  const event = useEvent(id);
  const categories = useCategoriesQuery();
  const { data: user } = useUser();
  if (event.isPending) return <Spinner label="Loading the session…" />;
  if (event.error) return <SessionMissing error={event.error} />;
  const e = event.data;
  const tz = e.timeZone;
  const excluded = new Set(e.excludedCategoryIds);
  const cats = categories.data ?? [];
  const taken = Object.entries(SKILL_LABELS)
    .map(([skill, label]) => ({
      label,
      names: cats.filter((c) => c.skill === skill && !excluded.has(c.id)).map((c) => c.name),
    }))
    .filter((g) => g.names.length);
  const refused = cats.filter((c) => excluded.has(c.id));
  const isOrganiser = user?.admin || user?.roles.some((r) => r.groupId === e.groupId && r.role === 'organiser');
  const bookable = e.status === 'published' && e.freePlaces > 0;

  return (
    // On a phone the session's name, date and place come first, then the free places and "Book a slot", then the
    // rest; on a wide screen the booking card stands beside them.
    <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
      <div className="space-y-6 lg:col-start-1">
        <header>
          <div className="flex flex-wrap items-center gap-2">
            <StatusBadge status={e.status} />
            {isOrganiser && (
              <Link to={paths.manageEvent(e.id)} className="text-sm font-bold text-navy underline">
                Manage this session
              </Link>
            )}
          </div>
          <h1 className="mt-2 text-3xl">{e.title}</h1>
          <p className="mt-1 text-lg font-bold text-copper-dark">
            {formatDay(e.startsAt, tz)} · {formatTimeRange(e.startsAt, e.endsAt, tz)}
          </p>
          <p className="text-ink-soft">{e.groupName}</p>
          {e.description && <p className="mt-3 max-w-2xl">{e.description}</p>}
        </header>

        <Card>
          <h2 className="text-lg">Where</h2>
          <p className="mt-1 font-semibold">{e.venue.name}</p>
          <p>
            {e.venue.address}, {e.venue.town}
          </p>
          {e.venue.accessNotes && <p className="mt-2 text-sm text-ink-soft">{e.venue.accessNotes}</p>}
        </Card>
      </div>

      <aside className="space-y-4 lg:sticky lg:top-4 lg:col-start-2 lg:row-span-2 lg:row-start-1 lg:self-start">
        <Card>
          <PlacesBar free={e.freePlaces} total={e.totalPlaces} />
          {e.status === 'published' ? (
            <Link
              to={paths.book(e.id)}
              className="mt-4 flex min-h-12 items-center justify-center rounded-lg bg-copper px-5 text-lg font-bold text-white hover:bg-copper-dark"
            >
              {bookable ? 'Book a slot' : 'Join a waiting list'}
            </Link>
          ) : (
            <Alert tone="info">
              {e.status === 'cancelled'
                ? 'This session has been cancelled.'
                : e.status === 'closed'
                  ? 'Booking has closed for this session.'
                  : 'This session is not open for booking yet.'}
            </Alert>
          )}
        </Card>
        <Card>
          <h2 className="text-lg">What to bring</h2>
          <ul className="mt-2 list-disc space-y-1 pl-5 text-sm">
            {WHAT_TO_BRING.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </Card>
      </aside>

      <div className="space-y-6 lg:col-start-1">
        <Card>
          <h2 className="text-lg">Times and free places</h2>
          <p className="text-sm text-ink-soft">
            Each time is the slot in which your repair starts; most take {e.slotMinutes}–60 minutes. Tap a time to book
            it.
          </p>
          {Object.keys(e.skillLimits).length > 0 && (
            <p className="mt-1 text-sm text-ink-soft">
              Per time, the fixers can take at most{' '}
              {Object.entries(e.skillLimits)
                .map(
                  ([k, n]) =>
                    `${n} ${SKILL_LABELS[k as keyof typeof SKILL_LABELS].toLowerCase()} item${n === 1 ? '' : 's'}`,
                )
                .join(', ')}
              .
            </p>
          )}
          <ul className="mt-3 grid grid-cols-2 gap-2 sm:grid-cols-3">
            {e.slots
              .filter((s) => !slotHasPassed(s, new Date()))
              .map((s) => (
                <li key={s.id}>
                  <Link
                    to={e.status === 'published' ? `${paths.book(e.id)}?slot=${s.id}` : paths.event(e.id)}
                    className={`block rounded-lg p-3 ring-1 hover:ring-copper ${s.free ? 'ring-ink/10' : 'bg-alert-light/50 ring-alert/30'}`}
                  >
                    <p className="font-bold">{formatTime(s.startsAt, tz)}</p>
                    <PlacesBar free={s.free} total={s.capacity} label={false} />
                    <p className="mt-1 text-xs font-semibold text-ink-soft">
                      {s.free ? `${s.free} free` : 'Full: waiting list'}
                    </p>
                  </Link>
                </li>
              ))}
          </ul>
        </Card>

        <div className="grid gap-4 md:grid-cols-2">
          <Card>
            <h2 className="text-lg">What we take</h2>
            <dl className="mt-2 space-y-2 text-sm">
              {taken.map((g) => (
                <div key={g.label}>
                  <dt className="font-bold">{g.label}</dt>
                  <dd className="text-ink-soft">{g.names.join(', ')}</dd>
                </div>
              ))}
            </dl>
          </Card>
          <Card>
            <h2 className="text-lg">What we do not take</h2>
            {refused.length === 0 ? (
              <p className="mt-2 text-sm text-ink-soft">This group has no exclusions beyond the safety rules below.</p>
            ) : (
              <ul className="mt-2 space-y-2 text-sm">
                {refused.map((c) => (
                  <li key={c.id}>
                    <span className="font-bold">{c.name}</span>
                    {c.refusal && <span className="text-ink-soft"> — {c.refusal.reason}</span>}
                  </li>
                ))}
              </ul>
            )}
            <p className="mt-3 text-sm text-ink-soft">
              Nor, anywhere: items with a swollen battery or a damaged mains cable.
            </p>
          </Card>
        </div>

        {e.houseRules && (
          <Card>
            <h2 className="text-lg">House rules</h2>
            <ul className="mt-2 list-disc space-y-1 pl-5">
              {e.houseRules
                .split('\n')
                .filter(Boolean)
                .map((l) => (
                  <li key={l}>{l}</li>
                ))}
            </ul>
          </Card>
        )}
      </div>
    </div>
  );
}
