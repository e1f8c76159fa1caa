import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { nextQueued } from '../../../../../shared/event-day/queue-days';
import { paths } from '../../../config/paths';
import { queueQuery } from '../api/get-queue';
import { useT } from '../../../lib/i18n';

const linkClass =
  'flex min-h-11 items-center justify-center rounded-lg px-4 py-2 text-center font-bold ring-1 ring-navy/20';

/**
 * Where the fixer goes once an item is done: the next open item in their queue (today's or a coming day's), and back to
 * the queue. The queue is read again, as the item just finished has left it.
 */
export function NextInQueue({ doneItemId }: { doneItemId: number }) {
  const t = useT();
  const { data: queue } = useQuery({ ...queueQuery(), refetchOnMount: 'always' });
  const next = nextQueued(
    (queue ?? []).filter((q) => q.itemId !== doneItemId && q.status !== 'done'),
    new Date(),
  );
  return (
    <nav aria-label={t('bench.next.nav')} className="grid gap-2 sm:grid-cols-2">
      {next && (
        <Link to={paths.item(next.itemId)} className={`${linkClass} bg-navy text-white`}>
          {t('bench.next.item', { kind: next.categoryName })}
          {next.tagCode && ` · ${next.tagCode}`}
        </Link>
      )}
      <Link to={paths.bench()} className={`${linkClass} bg-white text-navy`}>
        {t('bench.next.queue')}
      </Link>
    </nav>
  );
}
