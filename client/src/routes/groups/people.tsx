import { useState } from 'react';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { ROLE_LABELS } from '../../../../shared/constants';
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

export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(membersQuery(Number(params.groupId)));

export function GroupPeoplePage() {
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
            <p className="text-sm text-ink-soft">
              {ROLE_LABELS[r]}
              {byRole(r) === 1 ? '' : 's'}
            </p>
          </Card>
        ))}
      </div>

      <InviteForm groupId={groupId} />

      <section aria-labelledby="waiting">
        <h2 id="waiting" className="mb-3 text-xl">
          Waiting for your confirmation
        </h2>
        {approve.error && <Alert tone="error">{approve.error.message}</Alert>}
        {pending.length === 0 ? (
          <EmptyState title="Nobody is waiting" icon="✓">
            New volunteers who sign up for this group appear here.
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
                    {m.name} <span className="font-normal text-ink-soft">· {ROLE_LABELS[m.role]}</span>
                  </p>
                  <p className="text-sm text-ink-soft">
                    {m.email}
                    {m.verified ? '' : ' · e-mail not confirmed yet'}
                  </p>
                </div>
                <div className="flex gap-2">
                  <Button variant="secondary" onClick={() => setToRemove(m)}>
                    Decline
                  </Button>
                  <Button
                    onClick={() => approve.mutate(m.membershipId)}
                    busy={approve.isPending && approve.variables === m.membershipId}
                  >
                    Confirm
                  </Button>
                </div>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="team">
        <h2 id="team" className="mb-3 text-xl">
          Team
        </h2>
        <div className="overflow-x-auto rounded-xl bg-white ring-1 ring-ink/5">
          <table className="w-full text-left text-sm">
            <thead className="bg-navy/5 text-navy">
              <tr>
                <th className="px-4 py-2">Name</th>
                <th className="px-4 py-2">Role</th>
                <th className="hidden px-4 py-2 sm:table-cell">E-mail</th>
                <th className="px-4 py-2">
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {active.map((m) => (
                <tr key={m.membershipId} className="border-t border-ink/5">
                  <td className="px-4 py-2 font-semibold">{m.name}</td>
                  <td className="px-4 py-2">{ROLE_LABELS[m.role]}</td>
                  <td className="hidden px-4 py-2 text-ink-soft sm:table-cell">{m.email}</td>
                  <td className="px-4 py-2 text-right">
                    <button
                      className="rounded px-2 py-1 font-semibold text-alert hover:bg-alert-light"
                      onClick={() => setToRemove(m)}
                    >
                      Remove
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
        title={toRemove?.status === 'pending' ? 'Decline this volunteer?' : 'Remove this role?'}
        message={
          toRemove
            ? `${toRemove.name} will no longer be ${ROLE_LABELS[toRemove.role].toLowerCase()} with ${members.data.group.name}. Their account stays.`
            : ''
        }
        confirmLabel={toRemove?.status === 'pending' ? 'Decline' : 'Remove'}
        busy={remove.isPending}
        onCancel={() => setToRemove(null)}
        onConfirm={() => toRemove && remove.mutate(toRemove.membershipId, { onSettled: () => setToRemove(null) })}
      />
    </div>
  );
}

function InviteForm({ groupId }: { groupId: number }) {
  const invite = useInviteMember(groupId);
  const form = useZodForm(inviteSchema, { email: '', role: 'fixer' });
  const [error, setError] = useState<string | null>(null);
  return (
    <Card>
      <h2 className="text-lg">Invite a volunteer</h2>
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
          label="Their e-mail"
          type="email"
          error={form.formState.errors.email?.message}
          {...form.register('email', { onChange: () => invite.reset() })}
        />
        <SelectField label="Role" {...form.register('role')}>
          <option value="fixer">Fixer</option>
          <option value="host">Reception</option>
          <option value="organiser">Organiser</option>
        </SelectField>
        <Button type="submit" busy={form.formState.isSubmitting}>
          Send invitation
        </Button>
      </form>
      {invite.isSuccess && (
        <p role="status" className="mt-2 text-sm font-bold text-sage">
          Invitation sent. It works for 14 days.
        </p>
      )}
      {error && (
        <div className="mt-2">
          <Alert tone="error">{error}</Alert>
        </div>
      )}
    </Card>
  );
}
