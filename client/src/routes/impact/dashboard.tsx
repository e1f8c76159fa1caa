import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { GroupTabs } from '../../components/layouts/group-tabs';
import { PageTitle } from '../../components/ui/feedback';
import { useGroupEvents } from '../../features/events/api/get-group-events';
import { groupSettingsQuery } from '../../features/groups/api/get-group-settings';
import { impactSettingsQuery } from '../../features/impact/api/get-impact-settings';
import { methodQuery } from '../../features/impact/api/get-method';
import { statsQuery } from '../../features/impact/api/get-stats';
import { datesInOrder, ImpactBody, statsFilterOf } from '../../features/impact/components/impact-body';
import { useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';
import { DisplacementCard } from '../../features/impact/components/displacement-card';

/**
 * Fetches the figures (unless the dates are the wrong way round, which the page says itself), the method, and the
 * group's settings (its name) or, on the network page, the displacement setting. The page reads them; a failure to
 * fetch them is the route's error. The sessions for the filter stay a plain read: without them the figures still
 * show, with a hint.
 */
export const loader = ({ params, request }: LoaderFunctionArgs) => {
  const filter = statsFilterOf(new URL(request.url).searchParams, params.groupId ? Number(params.groupId) : undefined);
  return Promise.all([
    datesInOrder(filter) ? queryClient.ensureQueryData(statsQuery(filter)) : null,
    queryClient.ensureQueryData(methodQuery()),
    params.groupId
      ? queryClient.ensureQueryData(groupSettingsQuery(Number(params.groupId)))
      : queryClient.ensureQueryData(impactSettingsQuery()),
  ]);
};

/** A group's figures for its organisers. */
export function GroupImpactPage() {
  const t = useT();
  const groupId = Number(useParams().groupId);
  const { data: group } = useSuspenseQuery(groupSettingsQuery(groupId));
  const sessions = useGroupEvents(groupId);
  return (
    <div>
      <div className="mb-2">
        <h1 className="text-2xl sm:text-3xl">{group.name}</h1>
        <p className="mt-1 text-ink-soft">{t('figures.dashboard.groupLead')}</p>
      </div>
      <GroupTabs groupId={groupId} />
      <ImpactBody groupId={groupId} groupName={group.name} sessions={sessions} />
    </div>
  );
}

/** The whole network's figures for platform admins, and the one setting the estimate depends on. */
export function NetworkImpactPage() {
  const t = useT();
  return (
    <div>
      <PageTitle title={t('figures.dashboard.networkTitle')} lead={t('figures.dashboard.networkLead')} />
      <div className="mb-6">
        <DisplacementCard />
      </div>
      <ImpactBody />
    </div>
  );
}
