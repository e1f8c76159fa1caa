import { Link, Navigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert, Card, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { useUser } from '../../lib/auth';
import { publicTagQuery, usePublicTag } from '../../features/event-day/api/get-public-tag';
import { queryClient } from '../../lib/query-client';
import { StatusChip } from '../../features/event-day/components/status-chip';
import { trParts, useT } from '../../lib/i18n';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(publicTagQuery(String(params.code ?? '').toUpperCase())).catch(() => null);

/**
 * Where a scanned tag lands. The group's volunteers go straight to the item; anyone else (the visitor) sees the
 * item's status and queue number only.
 */
export function TagPage() {
  const t = useT();
  const code = String(useParams().code ?? '').toUpperCase();
  const { data: user, isPending: userPending } = useUser();
  const { data: tag, isPending, error } = usePublicTag(code);
  if (isPending || userPending) return <Spinner />;
  if (error)
    return (
      <Alert tone="error" title={t('desk.tag.notFound')}>
        {t('desk.tag.notFoundBody', { code })}
      </Alert>
    );
  const staff = user && (user.admin || user.roles.some((r) => r.groupId === tag.groupId));
  if (staff) return <Navigate to={paths.item(tag.itemId)} replace />;
  return (
    <div className="mx-auto max-w-md space-y-4">
      <Card className="text-center">
        <p className="text-sm text-ink-soft">
          {tag.groupName} · {tag.eventTitle}
        </p>
        <p className="my-2 font-mono text-4xl font-extrabold tracking-widest text-navy">{tag.tagCode}</p>
        <h1 className="text-2xl">{tag.categoryName}</h1>
        {tag.queueNumber !== null && (
          <p className="mt-1 text-lg">{trParts('desk.tag.queueNumber', { number: <b>{tag.queueNumber}</b> })}</p>
        )}
        <p className="mt-3">
          <StatusChip status={tag.status} />
        </p>
        {tag.outcomeLabel && <p className="mt-2 text-lg font-bold">{tag.outcomeLabel}</p>}
        {tag.waitMinutes !== null && (
          <p className="mt-2 text-ink-soft">
            {tag.waitMinutes === 0 ? t('desk.tag.anyMoment') : t('desk.tag.wait', { minutes: tag.waitMinutes })}
          </p>
        )}
      </Card>
      <p className="text-center text-sm text-ink-soft">
        {trParts('desk.tag.volunteers', {
          signIn: (
            <Link className="font-semibold text-navy underline" to={paths.signIn(paths.tag(tag.tagCode ?? code))}>
              {t('desk.tag.signIn')}
            </Link>
          ),
        })}
      </p>
    </div>
  );
}
