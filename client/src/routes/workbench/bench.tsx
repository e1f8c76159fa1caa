import { Link } from 'react-router';
import { PageTitle } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { useUser } from '../../lib/auth';
import { queryClient } from '../../lib/query-client';
import { StatusChip } from '../../features/event-day/components/status-chip';
import { myEventsQuery } from '../../features/rota/api/get-my-events';
import { MySessions } from '../../features/rota/components/my-sessions';
import { queueQuery, useQueue } from '../../features/workbench/api/get-queue';
import { QueueList } from '../../features/workbench/components/queue-list';
import { useT } from '../../lib/i18n';

/** The page reads what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. */
export const loader = () =>
  Promise.all([queryClient.ensureQueryData(queueQuery()), queryClient.ensureQueryData(myEventsQuery())]);

const toolLink = 'rounded-lg bg-white px-3 py-2 font-semibold text-navy ring-1 ring-navy/20';

/** The fixer's page on a phone: the items coming to them in order, then the sessions they can say yes to. */
export function BenchPage() {
  const t = useT();
  const { data: user } = useUser();
  const { data: queue } = useQueue();
  if (!user) return null;
  const fixerGroups = new Map(user.roles.filter((r) => r.role === 'fixer').map((r) => [r.groupId, r.groupName]));
  return (
    <div className="mx-auto max-w-3xl space-y-6">
      <PageTitle title={t('bench.page.title')} lead={t('bench.page.hello', { name: user.name.split(' ')[0] })} />
      <nav aria-label={t('bench.page.toolkit')} className="flex flex-wrap gap-2 text-sm">
        <Link to={paths.knowledge()} className={toolLink}>
          {t('bench.page.notes')}
        </Link>
        <Link to={paths.calculators()} className={toolLink}>
          {t('bench.page.calculators')}
        </Link>
        {[...fixerGroups.entries()].map(([id, name]) => (
          <Link key={id} to={paths.salvage(id)} className={toolLink}>
            {t('bench.page.salvage', { group: name })}
          </Link>
        ))}
      </nav>
      {/* Reception and other helpers get no items from triage: an empty "My queue" would only puzzle them. */}
      {(fixerGroups.size > 0 || queue.length > 0) && (
        <QueueList statusChip={(status) => <StatusChip status={status} />} />
      )}
      <MySessions />
    </div>
  );
}
