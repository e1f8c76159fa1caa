import { useState } from 'react';
import { Navigate, useNavigate } from 'react-router';
import { firstAdminSchema } from '../../../../shared/schemas/auth';
import { Button } from '../../components/ui/button';
import { Alert, Card, PageTitle, Spinner } from '../../components/ui/feedback';
import { TextField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { useConfig, configQuery } from '../../features/auth/api/get-config';
import { useCreateFirstAdmin } from '../../features/auth/api/create-first-admin';
import { applyServerErrors, useZodForm } from '../../lib/form';
import { queryClient } from '../../lib/query-client';
import { useT } from '../../lib/i18n';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = () => queryClient.ensureQueryData(configQuery).catch(() => null);

/** Shown once, on an empty installation: the first person becomes the platform admin. */
export function SetupPage() {
  const t = useT();
  const config = useConfig();
  const create = useCreateFirstAdmin();
  const navigate = useNavigate();
  const form = useZodForm(firstAdminSchema, { name: '', email: '', password: '', confirm: '', setupCode: '' });
  const [formError, setFormError] = useState<string | null>(null);
  const errors = form.formState.errors;
  if (config.isPending) return <Spinner />;
  if (!config.data?.needsSetup && !create.isPending) return <Navigate to={paths.signIn()} replace />;
  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await create.mutateAsync(values);
      navigate(paths.admin(), { replace: true });
    } catch (err) {
      setFormError(applyServerErrors(form, err));
    }
  });
  return (
    <div className="mx-auto max-w-lg">
      <PageTitle title={t('account.setup.title')} lead={t('account.setup.lead')} />
      <Card>
        <form onSubmit={onSubmit} noValidate className="space-y-4">
          {formError && <Alert tone="error">{formError}</Alert>}
          <TextField
            label={t('account.setup.code')}
            autoComplete="off"
            spellCheck={false}
            hint={t('account.setup.codeHint')}
            error={errors.setupCode?.message}
            {...form.register('setupCode')}
          />
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
          <TextField
            label={t('account.sameAgain')}
            type="password"
            autoComplete="new-password"
            error={errors.confirm?.message}
            {...form.register('confirm')}
          />
          <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
            {t('account.setup.submit')}
          </Button>
        </form>
      </Card>
    </div>
  );
}
