import { useState } from 'react';
import { Link } from 'react-router';
import { signupSchema } from '../../../../shared/schemas/auth';
import { Button } from '../../components/ui/button';
import { Alert, Card, PageTitle, Spinner } from '../../components/ui/feedback';
import { SelectField, TextField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { useSignUp } from '../../features/auth/api/sign-up';
import { usePublicGroups, publicGroupsQuery } from '../../features/groups/api/get-public-groups';
import { applyServerErrors, useZodForm } from '../../lib/form';
import { queryClient } from '../../lib/query-client';
import { tr, useT } from '../../lib/i18n';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = () => queryClient.ensureQueryData(publicGroupsQuery()).catch(() => null);

export function VolunteerPage() {
  const t = useT();
  const groups = usePublicGroups();
  const signUp = useSignUp();
  const form = useZodForm(signupSchema, { name: '', email: '', password: '', role: 'fixer' });
  const [formError, setFormError] = useState<string | null>(null);
  const errors = form.formState.errors;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await signUp.mutateAsync(values);
    } catch (err) {
      setFormError(applyServerErrors(form, err));
    }
  });

  if (signUp.isSuccess) {
    return (
      <Card className="mx-auto max-w-lg">
        <h1 className="text-2xl">{t('account.volunteer.checkMail')}</h1>
        <p className="mt-2">
          {signUp.data.message} {t('account.volunteer.afterConfirm')}
        </p>
        <Link to={paths.signIn()} className="mt-4 inline-block font-bold text-navy underline">
          {t('account.goToSignIn')}
        </Link>
      </Card>
    );
  }

  return (
    <div className="mx-auto max-w-lg">
      <PageTitle title={t('account.volunteer.title')} lead={t('account.volunteer.lead')} />
      <Card>
        {groups.isPending ? (
          <Spinner label={t('account.volunteer.loadingGroups')} />
        ) : groups.data?.length === 0 ? (
          <Alert>{t('account.volunteer.noGroups')}</Alert>
        ) : (
          <form onSubmit={onSubmit} noValidate className="space-y-4">
            {formError && <Alert tone="error">{formError}</Alert>}
            <TextField
              label={t('account.yourName')}
              autoComplete="name"
              error={errors.name?.message}
              {...form.register('name')}
            />
            <TextField
              label={t('account.email')}
              type="email"
              autoComplete="email"
              error={errors.email?.message}
              {...form.register('email')}
            />
            <TextField
              label={t('account.password')}
              type="password"
              autoComplete="new-password"
              hint={t('account.atLeast10')}
              error={errors.password?.message}
              {...form.register('password')}
            />
            <SelectField
              label={t('account.volunteer.group')}
              error={errors.groupId?.message}
              defaultValue=""
              {...form.register('groupId')}
            >
              <option value="" disabled>
                {t('account.volunteer.chooseGroup')}
              </option>
              {groups.data?.map((g) => (
                <option key={g.id} value={g.id}>
                  {g.name} — {g.town}
                </option>
              ))}
            </SelectField>
            <fieldset className="space-y-2">
              <legend className="font-semibold">{t('account.volunteer.how')}</legend>
              {[
                ['fixer', t('account.volunteer.asFixer'), t('account.volunteer.asFixerText')],
                ['host', t('account.volunteer.asHost'), t('account.volunteer.asHostText')],
              ].map(([value, label, text]) => (
                <label
                  key={value}
                  className="flex cursor-pointer gap-3 rounded-lg p-3 ring-1 ring-ink/15 has-checked:ring-2 has-checked:ring-copper"
                >
                  <input type="radio" value={value} className="mt-1 accent-copper" {...form.register('role')} />
                  <span>
                    <span className="block font-bold">{label}</span>
                    <span className="text-sm text-ink-soft">{text}</span>
                  </span>
                </label>
              ))}
              {errors.role?.message && <p className="text-sm font-semibold text-alert">{tr(errors.role.message)}</p>}
            </fieldset>
            <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
              {t('account.volunteer.submit')}
            </Button>
          </form>
        )}
      </Card>
    </div>
  );
}
