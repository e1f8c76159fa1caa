import { Link, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { SKILLS } from '../../../../shared/constants';
import { formatDay, formatTimeRange } from '../../../../shared/format';
import { Alert, Card, EmptyState, PageTitle, Spinner } from '../../components/ui/feedback';
import { MonthCalendar } from '../../components/ui/month-calendar';
import { SelectField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { useCategoriesQuery, categoriesQuery } from '../../features/categories/api/get-categories';
import { useEvents, eventsQuery } from '../../features/events/api/get-events';
import { usePublicGroups, publicGroupsQuery } from '../../features/groups/api/get-public-groups';
import { PlacesBar } from '../../features/events/components/places-bar';
import { useLanguage, useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ request }: LoaderFunctionArgs) => {
  const search = new URL(request.url).searchParams;
  const filters = {
    groupId: Number(search.get('group')) || undefined,
    categoryId: Number(search.get('category')) || undefined,
  };
  return Promise.all([
    queryClient.ensureQueryData(eventsQuery(filters)),
    queryClient.ensureQueryData(publicGroupsQuery()),
    queryClient.ensureQueryData(categoriesQuery()),
  ]).catch(() => null);
};

/** Upcoming sessions as a month calendar or a list, filtered by group and by the kind of item. */
export function EventsPage() {
  const t = useT();
  const lang = useLanguage();
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const view = params.get('view') === 'calendar' ? 'calendar' : 'list';
  const groupId = Number(params.get('group')) || undefined;
  const categoryId = Number(params.get('category')) || undefined;
  const events = useEvents({ groupId, categoryId });
  const groups = usePublicGroups();
  const categories = useCategoriesQuery();
  const set = (k: string, v: string) => {
    const next = new URLSearchParams(params);
    if (v) next.set(k, v);
    else next.delete(k);
    setParams(next, { replace: true });
  };
  const bySkill = SKILLS.map((skill) => ({
    label: t(`common.skill.${skill}`),
    cats: (categories.data ?? []).filter((c) => c.skill === skill && !c.refusal),
  }));

  return (
    <div className="space-y-6">
      <PageTitle title={t('events.list.title')} lead={t('events.list.lead')} />
      <div className="grid gap-3 rounded-xl bg-white p-4 ring-1 ring-ink/5 sm:grid-cols-[1fr_1fr_auto] sm:items-end">
        <SelectField
          label={t('events.list.group')}
          value={groupId ?? ''}
          onChange={(e) => set('group', e.target.value)}
        >
          <option value="">{t('events.list.allGroups')}</option>
          {groups.data?.map((g) => (
            <option key={g.id} value={g.id}>
              {g.name}
            </option>
          ))}
        </SelectField>
        <SelectField
          label={t('events.list.category')}
          value={categoryId ?? ''}
          onChange={(e) => set('category', e.target.value)}
        >
          <option value="">{t('events.list.anything')}</option>
          {bySkill
            .filter((s) => s.cats.length)
            .map((s) => (
              <optgroup key={s.label} label={s.label}>
                {s.cats.map((c) => (
                  <option key={c.id} value={c.id}>
                    {c.name}
                  </option>
                ))}
              </optgroup>
            ))}
        </SelectField>
        <div role="group" aria-label={t('events.list.view')} className="flex rounded-lg ring-1 ring-navy/20">
          {(['list', 'calendar'] as const).map((v) => (
            <button
              key={v}
              aria-pressed={view === v}
              onClick={() => set('view', v === 'list' ? '' : v)}
              className={`min-h-11 flex-1 px-4 font-bold first:rounded-l-lg last:rounded-r-lg ${view === v ? 'bg-navy text-white' : 'text-navy'}`}
            >
              {v === 'list' ? t('events.list.viewList') : t('events.list.viewCalendar')}
            </button>
          ))}
        </div>
      </div>

      {events.isPending && <Spinner label={t('events.list.loading')} />}
      {events.error && (
        <Alert tone="error" title={t('events.list.loadError')}>
          {events.error.message}
        </Alert>
      )}
      {events.data && view === 'calendar' && (
        <Card flush className="mendery-calendar p-3 sm:p-5">
          <MonthCalendar
            today
            events={events.data.map((e) => ({
              id: String(e.id),
              title: e.title,
              start: e.startsAt,
              end: e.endsAt,
              backgroundColor: e.freePlaces ? '#5d7f6a' : '#a8322d',
              borderColor: 'transparent',
              extendedProps: { free: e.freePlaces },
            }))}
            detail={(x) => (x.free ? t('events.list.calendarFree', { free: x.free }) : t('events.list.calendarFull'))}
            onOpen={(id) => navigate(paths.event(Number(id)))}
          />
        </Card>
      )}
      {events.data &&
        view === 'list' &&
        (events.data.length === 0 ? (
          <EmptyState title={t('events.list.emptyTitle')} icon="▦">
            {groupId || categoryId ? t('events.list.emptyFiltered') : t('events.list.emptyNone')}
          </EmptyState>
        ) : (
          <ul className="grid gap-4 md:grid-cols-2">
            {events.data.map((e) => (
              <li key={e.id}>
                <Link
                  to={paths.event(e.id)}
                  className="block rounded-xl bg-white p-5 shadow-sm ring-1 ring-ink/5 transition hover:ring-copper"
                >
                  <p className="text-sm font-bold text-copper-dark">
                    {formatDay(e.startsAt, e.timeZone, lang)} ·{' '}
                    {formatTimeRange(e.startsAt, e.endsAt, e.timeZone, lang)}
                  </p>
                  <h2 className="mt-1 text-lg">{e.title}</h2>
                  <p className="text-sm text-ink-soft">
                    {e.groupName} · {e.venue.name}, {e.venue.town}
                  </p>
                  <div className="mt-3">
                    <PlacesBar free={e.freePlaces} total={e.totalPlaces} />
                  </div>
                </Link>
              </li>
            ))}
          </ul>
        ))}
    </div>
  );
}
