import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { inviteSignupSchema } from '../../../../shared/schemas/auth';
import { Button } from '../../components/ui/button';
import { Alert, Card, Spinner } from '../../components/ui/feedback';
import { TextField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { useUser } from '../../lib/auth';
import { useAcceptInvite } from '../../features/groups/api/accept-invite';
import { useInvitation, invitationQuery } from '../../features/groups/api/get-invitation';
import { useSignUpFromInvite } from '../../features/groups/api/sign-up-from-invite';
import { applyServerErrors, useZodForm } from '../../lib/form';
import { landingPath } from '../../lib/roles';
import { queryClient } from '../../lib/query-client';
import { trParts, useT } from '../../lib/i18n';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(invitationQuery(params.token ?? '')).catch(() => null);

/** The link in an invitation mail: accept as the signed-in person, or make the account it was meant for. */
export function JoinPage() {
  const t = useT();
  const token = useParams().token ?? '';
  const invitation = useInvitation(token);
  const { data: user } = useUser();
  const accept = useAcceptInvite(token);
  const signup = useSignUpFromInvite(token);
  const navigate = useNavigate();
  const form = useZodForm(inviteSignupSchema, { name: '', password: '' });
  const [formError, setFormError] = useState<string | null>(null);
  if (invitation.isPending) return <Spinner />;
  if (invitation.error)
    return (
      <Alert tone="error" title={t('account.join.invalid')}>
        {invitation.error.message}
      </Alert>
    );
  const i = invitation.data;
  return (
    <Card className="mx-auto max-w-lg space-y-4">
      <h1 className="text-2xl">{t('account.join.title', { group: i.groupName })}</h1>
      <p>
        {trParts(
          'account.join.invitedAs',
          { role: <strong>{t(`account.role.${i.role}`)}</strong> },
          { email: i.email },
        )}
      </p>
      {accept.isSuccess ? (
        <Alert tone="success" title={t('account.join.welcome')}>
          {t('account.join.nowRole', { role: t(`account.role.${i.role}`), group: i.groupName })}{' '}
          <Link className="font-bold underline" to={paths.start()}>
            {t('account.join.yourPage')}
          </Link>
        </Alert>
      ) : user ? (
        <>
          {accept.error && <Alert tone="error">{accept.error.message}</Alert>}
          <Button busy={accept.isPending} onClick={() => accept.mutate()}>
            {t('account.join.acceptAs', { name: user.name })}
          </Button>
        </>
      ) : i.hasAccount ? (
        <Link
          to={paths.signIn(`/join/${token}`)}
          className="inline-flex min-h-11 items-center rounded-lg bg-copper px-5 font-bold text-white"
        >
          {t('account.join.signInToAccept')}
        </Link>
      ) : (
        <form
          noValidate
          className="space-y-3"
          onSubmit={form.handleSubmit(async (v) => {
            setFormError(null);
            try {
              const { user } = await signup.mutateAsync(v);
              navigate(landingPath(user), { replace: true });
            } catch (err) {
              setFormError(applyServerErrors(form, err));
            }
          })}
        >
          {formError && <Alert tone="error">{formError}</Alert>}
          <TextField
            label={t('account.yourName')}
            autoComplete="name"
            error={form.formState.errors.name?.message}
            {...form.register('name')}
          />
          <TextField
            label={t('account.join.choosePassword')}
            type="password"
            autoComplete="new-password"
            hint={t('account.atLeast10')}
            error={form.formState.errors.password?.message}
            {...form.register('password')}
          />
          <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
            {t('account.join.submit')}
          </Button>
        </form>
      )}
    </Card>
  );
}
