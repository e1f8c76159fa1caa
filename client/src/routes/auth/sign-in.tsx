import { useState } from 'react';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router';
import { DEMO_PASSWORD } from '../../../../shared/constants';
import { loginSchema } from '../../../../shared/schemas/auth';
import { Button } from '../../components/ui/button';
import { Alert, Card } from '../../components/ui/feedback';
import { TextField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { useConfig, configQuery } from '../../features/auth/api/get-config';
import { useSignIn } from '../../features/auth/api/sign-in';
import { SignInCodeForm } from '../../features/auth/components/sign-in-code-form';
import { useUser } from '../../lib/auth';
import { applyServerErrors, useZodForm } from '../../lib/form';
import { landingPath } from '../../lib/roles';
import { queryClient } from '../../lib/query-client';
import { trParts, useT } from '../../lib/i18n';

const DEMO_ACCOUNTS = [
  ['organiser@example.org', 'account.signIn.demo.organiser'],
  ['organisator@example.org', 'account.signIn.demo.organiserNl'],
  ['fixer@example.org', 'account.signIn.demo.fixer'],
  ['host@example.org', 'account.signIn.demo.host'],
  ['admin@example.org', 'account.signIn.demo.admin'],
];

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = () => queryClient.ensureQueryData(configQuery).catch(() => null);

export function SignInPage() {
  const t = useT();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const { data: user } = useUser();
  const config = useConfig();
  const signIn = useSignIn();
  const form = useZodForm(loginSchema, { email: '', password: '' });
  const [formError, setFormError] = useState<string | null>(null);
  const [codeStep, setCodeStep] = useState(false);
  const next = params.get('next');
  const safeNext = next && next.startsWith('/') && !next.startsWith('//') ? next : null;

  if (config.data?.needsSetup) return <Navigate to={paths.setup()} replace />;
  if (user && !signIn.isPending) return <Navigate to={safeNext ?? landingPath(user)} replace />;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      const { user } = await signIn.mutateAsync(values);
      if (user) navigate(safeNext ?? landingPath(user), { replace: true });
      else setCodeStep(true);
    } catch (err) {
      setFormError(applyServerErrors(form, err));
    }
  });

  const fill = (email: string) => {
    form.setValue('email', email);
    form.setValue('password', DEMO_PASSWORD);
  };

  return (
    <div className="mx-auto grid max-w-4xl gap-6 md:grid-cols-2">
      <Card>
        <h1 className="mb-4 text-2xl">{t('account.signIn.title')}</h1>
        {codeStep ? (
          <SignInCodeForm
            onSignedIn={(u) => navigate(safeNext ?? landingPath(u), { replace: true })}
            onRestart={(why) => {
              setCodeStep(false);
              form.setValue('password', '');
              setFormError(why ?? null);
            }}
          />
        ) : (
          <form onSubmit={onSubmit} noValidate className="space-y-4">
            {formError && <Alert tone="error">{formError}</Alert>}
            <TextField
              label={t('account.email')}
              type="email"
              autoComplete="username"
              error={form.formState.errors.email?.message}
              {...form.register('email')}
            />
            <TextField
              label={t('account.password')}
              type="password"
              autoComplete="current-password"
              error={form.formState.errors.password?.message}
              {...form.register('password')}
            />
            <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
              {t('account.signIn.submit')}
            </Button>
          </form>
        )}
        <div className="mt-4 flex flex-wrap justify-between gap-2 text-sm">
          <Link to={paths.forgotPassword()} className="font-semibold text-navy underline">
            {t('account.signIn.forgot')}
          </Link>
          <Link to={paths.volunteer()} className="font-semibold text-navy underline">
            {t('account.signIn.volunteer')}
          </Link>
        </div>
        <p className="mt-4 text-sm text-ink-soft">{t('account.signIn.visitorsNoAccount')}</p>
      </Card>
      {config.data?.demo && (
        <Card className="bg-copper-light/40">
          <h2 className="text-lg">{t('account.signIn.demoTitle')}</h2>
          <p className="mt-1 text-sm text-ink-soft">
            {trParts('account.signIn.demoLead', {
              password: <code className="rounded bg-white px-1 font-bold whitespace-nowrap">{DEMO_PASSWORD}</code>,
            })}
          </p>
          <ul className="mt-3 space-y-2">
            {DEMO_ACCOUNTS.map(([email, label]) => (
              <li key={email}>
                <button
                  type="button"
                  onClick={() => fill(email)}
                  className="w-full rounded-lg bg-white px-3 py-2 text-left ring-1 ring-ink/10 hover:ring-copper"
                >
                  <span className="block font-bold text-navy">{email}</span>
                  <span className="text-sm text-ink-soft">{t(label)}</span>
                </button>
              </li>
            ))}
          </ul>
        </Card>
      )}
    </div>
  );
}
