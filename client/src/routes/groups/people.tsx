import { useState } from 'react';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { Button } from '../../components/ui/button';
import { ConfirmDialog } from '../../components/ui/confirm-dialog';
import { GroupTabs } from '../../components/layouts/group-tabs';
import { Alert, Card, EmptyState } from '../../components/ui/feedback';
import { useApproveMember } from '../../features/groups/api/approve-member';
import { membersQuery } from '../../features/groups/api/get-members';
import { queryClient } from '../../lib/query-client';
import { useRemoveMember } from '../../features/groups/api/remove-member';
import { useInviteMember } from '../../features/groups/api/invite-member';
import type { Member } from '../../../../shared/api/groups';
import { inviteSchema } from '../../../../shared/schemas/auth';
import { SelectField, TextField } from '../../components/ui/field';
import { applyServerErrors, useZodForm } from '../../lib/form';
import { tr, useT } from '../../lib/i18n';

export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(membersQuery(Number(params.groupId)));

export function GroupPeoplePage() {
  const t = useT();
  const groupId = Number(useParams().groupId);
  const members = useSuspenseQuery(membersQuery(groupId));
  const approve = useApproveMember(groupId);
  const remove = useRemoveMember(groupId);
  const [toRemove, setToRemove] = useState<Member | null>(null);

  const pending = members.data.members.filter((m) => m.status === 'pending');
  const active = members.data.members.filter((m) => m.status === 'active');
  const byRole = (role: Member['role']) => active.filter((m) => m.role === role).length;

  return (
    <div className="space-y-6">
      <div>
        <h1 className="mb-2 text-2xl sm:text-3xl">{members.data.group.name}</h1>
        <GroupTabs groupId={groupId} />
      </div>
      <div className="grid grid-cols-3 gap-3">
        {(['organiser', 'fixer', 'host'] as const).map((r) => (
          <Card key={r} className="text-center">
            <p className="text-3xl font-extrabold text-navy">{byRole(r)}</p>
            <p className="text-sm text-ink-soft">{t(`organise.people.count.${r}`, { n: byRole(r) })}</p>
          </Card>
        ))}
      </div>

      <InviteForm groupId={groupId} />

      <section aria-labelledby="waiting">
        <h2 id="waiting" className="mb-3 text-xl">
          {t('organise.people.waiting')}
        </h2>
        {approve.error && <Alert tone="error">{tr(approve.error.message)}</Alert>}
        {pending.length === 0 ? (
          <EmptyState title={t('organise.people.nobodyWaiting')} icon="✓">
            {t('organise.people.nobodyWaitingBody')}
          </EmptyState>
        ) : (
          <ul className="space-y-2">
            {pending.map((m) => (
              <li
                key={m.membershipId}
                className="flex flex-wrap items-center justify-between gap-3 rounded-xl bg-white p-4 ring-1 ring-copper/40"
              >
                <div>
                  <p className="font-bold">
                    {m.name} <span className="font-normal text-ink-soft">· {t(`organise.role.${m.role}`)}</span>
                  </p>
                  <p className="text-sm text-ink-soft">
                    {m.email}
                    {m.verified ? '' : ` · ${t('organise.people.unverified')}`}
                  </p>
                </div>
                <div className="flex gap-2">
                  <Button variant="secondary" onClick={() => setToRemove(m)}>
                    {t('organise.people.decline')}
                  </Button>
                  <Button
                    onClick={() => approve.mutate(m.membershipId)}
                    busy={approve.isPending && approve.variables === m.membershipId}
                  >
                    {t('organise.people.confirm')}
                  </Button>
                </div>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="team">
        <h2 id="team" className="mb-3 text-xl">
          {t('organise.people.team')}
        </h2>
        <div className="overflow-x-auto rounded-xl bg-white ring-1 ring-ink/5">
          <table className="w-full text-left text-sm">
            <thead className="bg-navy/5 text-navy">
              <tr>
                <th className="px-4 py-2">{t('organise.people.name')}</th>
                <th className="px-4 py-2">{t('organise.people.role')}</th>
                <th className="hidden px-4 py-2 sm:table-cell">{t('organise.people.email')}</th>
                <th className="px-4 py-2">
                  <span className="sr-only">{t('organise.manage.actions')}</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {active.map((m) => (
                <tr key={m.membershipId} className="border-t border-ink/5">
                  <td className="px-4 py-2 font-semibold">{m.name}</td>
                  <td className="px-4 py-2">{t(`organise.role.${m.role}`)}</td>
                  <td className="hidden px-4 py-2 text-ink-soft sm:table-cell">{m.email}</td>
                  <td className="px-4 py-2 text-right">
                    <button
                      className="rounded px-2 py-1 font-semibold text-alert hover:bg-alert-light"
                      onClick={() => setToRemove(m)}
                    >
                      {t('organise.people.remove')}
                    </button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      <ConfirmDialog
        open={toRemove !== null}
        title={
          toRemove?.status === 'pending' ? t('organise.people.declineQuestion') : t('organise.people.removeQuestion')
        }
        message={
          toRemove
            ? t(`organise.people.removeMessage.${toRemove.role}`, {
                name: toRemove.name,
                group: members.data.group.name,
              })
            : ''
        }
        confirmLabel={toRemove?.status === 'pending' ? t('organise.people.decline') : t('organise.people.remove')}
        busy={remove.isPending}
        onCancel={() => setToRemove(null)}
        onConfirm={() => toRemove && remove.mutate(toRemove.membershipId, { onSettled: () => setToRemove(null) })}
      />
    </div>
  );
}

function InviteForm({ groupId }: { groupId: number }) {
  const t = useT();
  const invite = useInviteMember(groupId);
  const form = useZodForm(inviteSchema, { email: '', role: 'fixer' });
  const [error, setError] = useState<string | null>(null);
  return (
    <Card>
      <h2 className="text-lg">{t('organise.people.invite')}</h2>
      <form
        noValidate
        className="mt-2 grid gap-3 sm:grid-cols-[1fr_12rem_auto] sm:items-end"
        onSubmit={form.handleSubmit(async (v) => {
          setError(null);
          try {
            await invite.mutateAsync(v);
            form.reset({ email: '', role: v.role });
          } catch (err) {
            setError(applyServerErrors(form, err));
          }
        })}
      >
        <TextField
          label={t('organise.people.theirEmail')}
          type="email"
          error={form.formState.errors.email?.message}
          {...form.register('email', { onChange: () => invite.reset() })}
        />
        <SelectField label={t('organise.people.role')} {...form.register('role')}>
          <option value="fixer">{t('organise.role.fixer')}</option>
          <option value="host">{t('organise.role.host')}</option>
          <option value="organiser">{t('organise.role.organiser')}</option>
        </SelectField>
        <Button type="submit" busy={form.formState.isSubmitting}>
          {t('organise.people.send')}
        </Button>
      </form>
      {invite.isSuccess && (
        <p role="status" className="mt-2 text-sm font-bold text-sage">
          {t('organise.people.sent', { days: 14 })}
        </p>
      )}
      {error && (
        <div className="mt-2">
          <Alert tone="error">{tr(error)}</Alert>
        </div>
      )}
    </Card>
  );
}
