import { useState } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { splitSessions } from '../../../../shared/sessions';
import { GroupTabs } from '../../components/layouts/group-tabs';
import { Alert, EmptyState, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { useGroupEvents, groupEventsQuery } from '../../features/events/api/get-group-events';
import { ComingRow, PastRow } from '../../features/events/components/session-rows';
import { useGroupSettings, groupSettingsQuery } from '../../features/groups/api/get-group-settings';
import { useSessionFigures } from '../../features/impact/api/get-session-figures';
import { organises, useUser } from '../../lib/auth';
import { useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  Promise.all([
    queryClient.ensureQueryData(groupEventsQuery(Number(params.groupId))),
    queryClient.ensureQueryData(groupSettingsQuery(Number(params.groupId))),
  ]).catch(() => null);

/** Past sessions shown at first; the rest come a page at a time. */
const PAST_PAGE = 6;

/** A group's sessions: today's and the coming ones first, soonest first; past ones apart, with what came of them. */
export function GroupEventsPage() {
  const t = useT();
  const groupId = Number(useParams().groupId);
  const events = useGroupEvents(groupId);
  const group = useGroupSettings(groupId);
  const { data: user } = useUser();
  const figures = useSessionFigures(groupId, organises(user, groupId));
  const [pastShown, setPastShown] = useState(PAST_PAGE);
  const { coming, past } = splitSessions(events.data ?? [], new Date());
  const figuresOf = (eventId: number) =>
    figures.data ? (figures.data.find((f) => f.eventId === eventId) ?? null) : undefined;
  return (
    <div>
      <div className="mb-2 flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl sm:text-3xl">{group.data?.name ?? t('organise.sessions.title')}</h1>
        <Link
          to={paths.newEvent(groupId)}
          className="inline-flex min-h-11 items-center rounded-lg bg-copper px-4 font-bold text-white hover:bg-copper-dark"
        >
          {t('organise.sessions.new')}
        </Link>
      </div>
      <GroupTabs groupId={groupId} />
      {events.isPending && <Spinner />}
      {events.error && <Alert tone="error">{events.error.message}</Alert>}
      {events.data && (
        <div className="space-y-8">
          <section aria-labelledby="coming-sessions">
            <h2 id="coming-sessions" className="mb-3 text-xl">
              {t('organise.sessions.coming')}
            </h2>
            {coming.length === 0 ? (
              <EmptyState title={t('organise.sessions.noneComingTitle')} icon="▦">
                {t('organise.sessions.noneComing')}
              </EmptyState>
            ) : (
              <ul className="space-y-3">
                {coming.map((e) => (
                  <li key={e.id}>
                    <ComingRow e={e} today={e.when === 'today'} />
                  </li>
                ))}
              </ul>
            )}
          </section>
          <section aria-labelledby="past-sessions">
            <h2 id="past-sessions" className="mb-3 text-xl">
              {t('organise.sessions.past')}{' '}
              {past.length > 0 && <span className="text-base text-ink-soft">({past.length})</span>}
            </h2>
            {figures.error && (
              <Alert tone="error">{t('organise.sessions.figuresError', { message: figures.error.message })}</Alert>
            )}
            {past.length === 0 ? (
              <EmptyState title={t('organise.sessions.nonePastTitle')} icon="◷">
                {t('organise.sessions.nonePast')}
              </EmptyState>
            ) : (
              <>
                <ul className="space-y-2">
                  {past.slice(0, pastShown).map((e) => (
                    <li key={e.id}>
                      <PastRow e={e} figures={figuresOf(e.id)} />
                    </li>
                  ))}
                </ul>
                {past.length > pastShown && (
                  <button
                    type="button"
                    onClick={() => setPastShown((n) => n + PAST_PAGE)}
                    className="mt-3 inline-flex min-h-11 items-center rounded-lg px-4 font-bold text-navy ring-1 ring-navy/25 hover:bg-navy/5"
                  >
                    {t('organise.sessions.showEarlier', { n: Math.min(PAST_PAGE, past.length - pastShown) })}
                  </button>
                )}
              </>
            )}
          </section>
        </div>
      )}
    </div>
  );
}
