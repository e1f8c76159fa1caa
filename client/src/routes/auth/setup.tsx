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

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = () => queryClient.ensureQueryData(configQuery).catch(() => null);

/** Shown once, on an empty installation: the first person becomes the platform admin. */
export function SetupPage() {
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
      <PageTitle
        title="Set up Mendery"
        lead="This installation is empty. Create the first admin account: it runs the network, adds repair groups and reads the local mailbox."
      />
      <Card>
        <form onSubmit={onSubmit} noValidate className="space-y-4">
          {formError && <Alert tone="error">{formError}</Alert>}
          <TextField
            label="Setup code"
            autoComplete="off"
            spellCheck={false}
            hint="Mendery printed it in the server’s console when it started, on the line that begins “Setup code”."
            error={errors.setupCode?.message}
            {...form.register('setupCode')}
          />
          <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register('name')} />
          <TextField
            label="E-mail"
            type="email"
            autoComplete="email"
            error={errors.email?.message}
            {...form.register('email')}
          />
          <TextField
            label="Password"
            type="password"
            autoComplete="new-password"
            hint="At least 10 characters."
            error={errors.password?.message}
            {...form.register('password')}
          />
          <TextField
            label="The same again"
            type="password"
            autoComplete="new-password"
            error={errors.confirm?.message}
            {...form.register('confirm')}
          />
          <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
            Create the admin account
          </Button>
        </form>
      </Card>
    </div>
  );
}
