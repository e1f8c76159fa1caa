import { lazy, Suspense, useEffect } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { slotHasPassed } from '../../../../shared/booking/bookability';
import { SKILLS, type Skill } from '../../../../shared/constants';
import { formatDay, formatTime, formatTimeRange } from '../../../../shared/format';
import { Alert, Card, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { useUser } from '../../lib/auth';
import { useCategoriesQuery, categoriesQuery } from '../../features/categories/api/get-categories';
import { useEvent, eventQuery } from '../../features/events/api/get-event';
import { PlacesBar, StatusBadge } from '../../features/events/components/places-bar';
import { followGroupLanguage, useLanguage, useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';

// Said only when the session cannot be shown: it comes on demand, not with every visit to the page.
const SessionMissing = lazy(() =>
  import('../../features/events/components/session-missing').then((m) => ({ default: m.SessionMissing })),
);

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  Promise.all([
    queryClient.ensureQueryData(eventQuery(Number(params.eventId))),
    queryClient.ensureQueryData(categoriesQuery()),
  ]).catch(() => null);

export function EventPage() {
  const t = useT();
  const lang = useLanguage();
  const id = Number(useParams().eventId);
  const event = useEvent(id);
  const groupLanguage = event.data?.groupLanguage;
  // The group's language for a visitor whose browser speaks none of ours; the page's data follows it.
  useEffect(() => followGroupLanguage(groupLanguage, () => void queryClient.invalidateQueries()), [groupLanguage]);
  const categories = useCategoriesQuery();
  const { data: user } = useUser();
  if (event.isPending) return <Spinner label={t('events.detail.loading')} />;
  if (event.error)
    return (
      <Suspense fallback={<Spinner />}>
        <SessionMissing error={event.error} />
      </Suspense>
    );
  const e = event.data;
  const tz = e.timeZone;
  const excluded = new Set(e.excludedCategoryIds);
  const cats = categories.data ?? [];
  const skillName = (skill: string) => t(`common.skill.${skill}`);
  const taken = SKILLS.map((skill) => ({
    label: skillName(skill),
    names: cats.filter((c) => c.skill === skill && !excluded.has(c.id)).map((c) => c.name),
  })).filter((g) => g.names.length);
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
                {t('events.detail.manage')}
              </Link>
            )}
          </div>
          <h1 className="mt-2 text-3xl">{e.title}</h1>
          <p className="mt-1 text-lg font-bold text-copper-dark">
            {formatDay(e.startsAt, tz, lang)} · {formatTimeRange(e.startsAt, e.endsAt, tz, lang)}
          </p>
          <p className="text-ink-soft">{e.groupName}</p>
          {e.description && <p className="mt-3 max-w-2xl">{e.description}</p>}
        </header>

        <Card>
          <h2 className="text-lg">{t('events.detail.where')}</h2>
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
              {bookable ? t('events.detail.book') : t('events.detail.waitlist')}
            </Link>
          ) : (
            <Alert tone="info">
              {e.status === 'cancelled'
                ? t('events.detail.cancelled')
                : e.status === 'closed'
                  ? t('events.detail.closed')
                  : t('events.detail.notOpen')}
            </Alert>
          )}
        </Card>
        <Card>
          <h2 className="text-lg">{t('events.detail.bringTitle')}</h2>
          <ul className="mt-2 list-disc space-y-1 pl-5 text-sm">
            {[1, 2, 3, 4].map((n) => (
              <li key={n}>{t(`events.detail.bring${n}`)}</li>
            ))}
          </ul>
        </Card>
      </aside>

      <div className="space-y-6 lg:col-start-1">
        <Card>
          <h2 className="text-lg">{t('events.detail.timesTitle')}</h2>
          <p className="text-sm text-ink-soft">{t('events.detail.timesLead', { minutes: e.slotMinutes })}</p>
          {Object.keys(e.skillLimits).length > 0 && (
            <p className="mt-1 text-sm text-ink-soft">
              {t('events.detail.skillLimits', {
                limits: Object.entries(e.skillLimits)
                  .map(([k, n]) => `${skillName(k as Skill)} ${n}`)
                  .join(', '),
              })}
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
                    <p className="font-bold">{formatTime(s.startsAt, tz, lang)}</p>
                    <PlacesBar free={s.free} total={s.capacity} label={false} />
                    <p className="mt-1 text-xs font-semibold text-ink-soft">
                      {s.free ? t('events.detail.slotFree', { free: s.free }) : t('events.detail.slotFull')}
                    </p>
                  </Link>
                </li>
              ))}
          </ul>
        </Card>

        <div className="grid gap-4 md:grid-cols-2">
          <Card>
            <h2 className="text-lg">{t('events.detail.takeTitle')}</h2>
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
            <h2 className="text-lg">{t('events.detail.refuseTitle')}</h2>
            {refused.length === 0 ? (
              <p className="mt-2 text-sm text-ink-soft">{t('events.detail.noExclusions')}</p>
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
            <p className="mt-3 text-sm text-ink-soft">{t('events.detail.neverTaken')}</p>
          </Card>
        </div>

        {e.houseRules && (
          <Card>
            <h2 className="text-lg">{t('events.detail.houseRules')}</h2>
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
