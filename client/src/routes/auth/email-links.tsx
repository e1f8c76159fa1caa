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

export function VerifyEmailPage() {
  const [params] = useSearchParams();
  const verify = useVerifyEmail();
  const token = params.get('token') ?? '';
  const { mutate } = verify;
  useEffect(() => {
    if (token) mutate(token);
  }, [token, mutate]);
  return (
    <Card className="mx-auto max-w-lg">
      <h1 className="text-2xl">Confirm your e-mail address</h1>
      <div className="mt-4">
        {!token && <Alert tone="error">This link has no token. Open the link from the mail again.</Alert>}
        {verify.isPending && <Spinner label="Confirming…" />}
        {verify.error && (
          <Alert tone="error">
            {verify.error instanceof ApiError && verify.error.fields?.token
              ? `${verify.error.fields.token} Open the link from the mail again, or copy the whole address into the browser.`
              : verify.error.message}
          </Alert>
        )}
        {verify.isSuccess && (
          <Alert tone="success" title="Thank you">
            {verify.data.message} An organiser of the group will confirm your place and you will get a mail when they
            have.
          </Alert>
        )}
      </div>
      <Link to={paths.signIn()} className="mt-4 inline-block font-bold text-navy underline">
        Go to sign-in
      </Link>
    </Card>
  );
}

export function ForgotPasswordPage() {
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
      <h1 className="text-2xl">Forgot your password?</h1>
      {request.isSuccess ? (
        <Alert tone="success">{request.data.message} The link works once, for one hour.</Alert>
      ) : (
        <form onSubmit={onSubmit} noValidate className="mt-4 space-y-4">
          <p className="text-ink-soft">
            Enter the address you signed up with. We will mail you a link to choose a new password.
          </p>
          {formError && <Alert tone="error">{formError}</Alert>}
          <TextField
            label="E-mail"
            type="email"
            autoComplete="email"
            error={form.formState.errors.email?.message}
            {...form.register('email')}
          />
          <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
            Send the link
          </Button>
        </form>
      )}
    </Card>
  );
}

export function ResetPasswordPage() {
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
      <h1 className="text-2xl">Choose a new password</h1>
      {!token.success ? (
        // A cut link is told apart before anyone types a new password twice for nothing.
        <div className="mt-4 space-y-3">
          <Alert tone="error">
            {token.error.issues[0]?.message ?? 'The link is incomplete.'} Open the link from the mail again, or ask for
            a new one.
          </Alert>
          <Link to={paths.forgotPassword()} className="inline-block font-bold text-navy underline">
            Ask for a new link
          </Link>
        </div>
      ) : (
        <form onSubmit={onSubmit} noValidate className="mt-4 space-y-4">
          {(formError || form.formState.errors.token) && (
            <Alert tone="error">{formError ?? form.formState.errors.token?.message}</Alert>
          )}
          <TextField
            label="New password"
            type="password"
            autoComplete="new-password"
            hint="At least 10 characters."
            error={form.formState.errors.password?.message}
            {...form.register('password')}
          />
          <TextField
            label="The same again"
            type="password"
            autoComplete="new-password"
            error={form.formState.errors.confirm?.message}
            {...form.register('confirm')}
          />
          <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
            Save the new password
          </Button>
        </form>
      )}
    </Card>
  );
}
