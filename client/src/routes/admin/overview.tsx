import { Link } from 'react-router';
import { Alert, Card, PageTitle, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { MergeGroup } from '../../features/admin/components/merge-group';
import { useAdminGroups, adminGroupsQuery } from '../../features/admin/api/get-admin-groups';
import { useAdminUsers, adminUsersQuery } from '../../features/admin/api/get-admin-users';
import { useOutbox, outboxQuery } from '../../features/admin/api/get-outbox';
import { queryClient } from '../../lib/query-client';
import { tr, trParts, useT } from '../../lib/i18n';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = () =>
  Promise.all([
    queryClient.ensureQueryData(adminGroupsQuery()),
    queryClient.ensureQueryData(adminUsersQuery()),
    queryClient.ensureQueryData(outboxQuery()),
  ]).catch(() => null);

export function AdminOverviewPage() {
  const t = useT();
  const groups = useAdminGroups();
  const users = useAdminUsers();
  const outbox = useOutbox();
  return (
    <div className="space-y-6">
      <PageTitle title={t('admin.title')} lead={t('admin.lead')} />
      <p>
        <Link to={paths.networkImpact()} className="font-semibold text-navy underline">
          {t('admin.networkImpact')}
        </Link>{' '}
        <span className="text-ink-soft">— {t('admin.networkImpactLead')}</span>
      </p>
      <div className="grid gap-4 md:grid-cols-3">
        <Card>
          <h2 className="text-lg">{t('admin.groups')}</h2>
          {groups.isPending ? (
            <Spinner />
          ) : groups.error ? (
            <Alert tone="error">{tr(groups.error.message)}</Alert>
          ) : (
            <ul className="mt-2 space-y-1">
              {groups.data.map((g) => (
                <li key={g.id}>
                  <Link className="font-semibold text-navy underline" to={paths.groupPeople(g.id)}>
                    {g.name}
                  </Link>{' '}
                  <span className="text-sm text-ink-soft">
                    {' · '}
                    {g.historyOnly ? t('admin.historyOnly') : `${g.town} · ${t('admin.roles', { n: g.members })}`}
                  </span>
                  {g.historyOnly && <MergeGroup group={g} groups={groups.data} />}
                </li>
              ))}
            </ul>
          )}
        </Card>
        <Card>
          <h2 className="text-lg">{t('admin.people')}</h2>
          {users.isPending ? (
            <Spinner />
          ) : users.error ? (
            <Alert tone="error">{tr(users.error.message)}</Alert>
          ) : (
            <p className="mt-2">
              {trParts(
                'admin.accounts',
                { count: <span className="text-3xl font-extrabold text-navy">{users.data.length}</span> },
                { n: users.data.length, unconfirmed: users.data.filter((u) => !u.verified).length },
              )}
            </p>
          )}
        </Card>
        <Card>
          <h2 className="text-lg">{t('admin.outgoing')}</h2>
          {outbox.isPending ? (
            <Spinner />
          ) : outbox.error ? (
            <Alert tone="error">{tr(outbox.error.message)}</Alert>
          ) : (
            <dl className="mt-2 grid grid-cols-3 text-center">
              {(['sent', 'pending', 'failed'] as const).map((s) => (
                <div key={s}>
                  <dt className="text-sm text-ink-soft">{t(`admin.mail.${s}`)}</dt>
                  <dd
                    className={`text-2xl font-extrabold ${s === 'failed' && outbox.data.totals.failed ? 'text-alert' : 'text-navy'}`}
                  >
                    {outbox.data.totals[s] ?? 0}
                  </dd>
                </div>
              ))}
            </dl>
          )}
          <Link to={paths.adminMailbox()} className="mt-3 inline-block font-semibold text-navy underline">
            {t('admin.openMailbox')}
          </Link>
        </Card>
      </div>
      {outbox.data && outbox.data.recent.some((m) => m.status !== 'sent') && (
        <Card>
          <h2 className="text-lg">{t('admin.undelivered')}</h2>
          <ul className="mt-2 divide-y divide-ink/5 text-sm">
            {outbox.data.recent
              .filter((m) => m.status !== 'sent')
              .map((m) => (
                <li key={m.id} className="py-2">
                  <span className="font-semibold">{m.subject}</span> → {m.to} · {t(`admin.mail.${m.status}`)},{' '}
                  {t('admin.attempts', { n: m.attempts })}
                  {m.lastError ? ` · ${m.lastError}` : ''}
                </li>
              ))}
          </ul>
        </Card>
      )}
    </div>
  );
}
