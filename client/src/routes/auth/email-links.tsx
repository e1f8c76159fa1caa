import { useEffect, useState } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { resetConfirmSchema, resetRequestSchema, tokenSchema } from '../../../../shared/schemas/auth';
import { Button } from '../../components/ui/button';
import { Alert, Card, Spinner } from '../../components/ui/feedback';
import { TextField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { useConfirmReset } from '../../features/auth/api/confirm-reset';
import { useRequestReset } from '../../features/auth/api/request-reset';
import { useVerifyEmail } from '../../features/auth/api/verify-email';
import { ApiError } from '../../lib/api';
import { applyServerErrors, useZodForm } from '../../lib/form';
import { tr, useT } from '../../lib/i18n';

export function VerifyEmailPage() {
  const t = useT();
  const [params] = useSearchParams();
  const verify = useVerifyEmail();
  const token = params.get('token') ?? '';
  const { mutate } = verify;
  useEffect(() => {
    if (token) mutate(token);
  }, [token, mutate]);
  return (
    <Card className="mx-auto max-w-lg">
      <h1 className="text-2xl">{t('account.verify.title')}</h1>
      <div className="mt-4">
        {!token && <Alert tone="error">{t('account.verify.noToken')}</Alert>}
        {verify.isPending && <Spinner label={t('account.verify.confirming')} />}
        {verify.error && (
          <Alert tone="error">
            {verify.error instanceof ApiError && verify.error.fields?.token
              ? t('account.verify.badToken', { problem: verify.error.fields.token })
              : verify.error.message}
          </Alert>
        )}
        {verify.isSuccess && (
          <Alert tone="success" title={t('account.verify.thanks')}>
            {verify.data.message} {t('account.verify.next')}
          </Alert>
        )}
      </div>
      <Link to={paths.signIn()} className="mt-4 inline-block font-bold text-navy underline">
        {t('account.goToSignIn')}
      </Link>
    </Card>
  );
}

export function ForgotPasswordPage() {
  const t = useT();
  const request = useRequestReset();
  const form = useZodForm(resetRequestSchema, { email: '' });
  const [formError, setFormError] = useState<string | null>(null);
  const onSubmit = form.handleSubmit(async ({ email }) => {
    setFormError(null);
    try {
      await request.mutateAsync(email);
    } catch (err) {
      setFormError(applyServerErrors(form, err));
    }
  });
  return (
    <Card className="mx-auto max-w-lg">
      <h1 className="text-2xl">{t('account.forgot.title')}</h1>
      {request.isSuccess ? (
        <Alert tone="success">
          {request.data.message} {t('account.forgot.once')}
        </Alert>
      ) : (
        <form onSubmit={onSubmit} noValidate className="mt-4 space-y-4">
          <p className="text-ink-soft">{t('account.forgot.lead')}</p>
          {formError && <Alert tone="error">{formError}</Alert>}
          <TextField
            label={t('account.email')}
            type="email"
            autoComplete="email"
            error={form.formState.errors.email?.message}
            {...form.register('email')}
          />
          <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
            {t('account.forgot.submit')}
          </Button>
        </form>
      )}
    </Card>
  );
}

export function ResetPasswordPage() {
  const t = useT();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const confirm = useConfirmReset();
  const form = useZodForm(resetConfirmSchema, { token: params.get('token') ?? '', password: '', confirm: '' });
  const [formError, setFormError] = useState<string | null>(null);
  const token = tokenSchema.safeParse({ token: params.get('token') ?? '' });
  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await confirm.mutateAsync(values);
      navigate(paths.signIn(), { replace: true });
    } catch (err) {
      setFormError(applyServerErrors(form, err));
    }
  });
  return (
    <Card className="mx-auto max-w-lg">
      <h1 className="text-2xl">{t('account.reset.title')}</h1>
      {!token.success ? (
        // A cut link is told apart before anyone types a new password twice for nothing.
        <div className="mt-4 space-y-3">
          <Alert tone="error">
            {t('account.reset.openAgain', {
              problem: tr(token.error.issues[0]?.message ?? 'account.reset.incomplete'),
            })}
          </Alert>
          <Link to={paths.forgotPassword()} className="inline-block font-bold text-navy underline">
            {t('account.reset.askNew')}
          </Link>
        </div>
      ) : (
        <form onSubmit={onSubmit} noValidate className="mt-4 space-y-4">
          {(formError || form.formState.errors.token) && (
            <Alert tone="error">
              {formError ?? tr(form.formState.errors.token?.message ?? 'validation.link.incomplete')}
            </Alert>
          )}
          <TextField
            label={t('account.newPassword')}
            type="password"
            autoComplete="new-password"
            hint={t('account.atLeast10')}
            error={form.formState.errors.password?.message}
            {...form.register('password')}
          />
          <TextField
            label={t('account.sameAgain')}
            type="password"
            autoComplete="new-password"
            error={form.formState.errors.confirm?.message}
            {...form.register('confirm')}
          />
          <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
            {t('account.saveNewPassword')}
          </Button>
        </form>
      )}
    </Card>
  );
}
