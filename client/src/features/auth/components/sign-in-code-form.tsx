import { useState } from 'react';
import type { SessionUser } from '../../../../../shared/schemas/auth';
import { totpCodeSchema } from '../../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { Alert } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { ApiError } from '../../../lib/api';
import { applyServerErrors, useZodForm } from '../../../lib/form';
import { useSignInCode } from '../api/two-factor';

/** The second step of signing in: the 6 digits from the person's authenticator app. */
export function SignInCodeForm({
  onSignedIn,
  onRestart,
}: {
  onSignedIn: (u: SessionUser) => void;
  onRestart: (why?: string) => void;
}) {
  const send = useSignInCode();
  const form = useZodForm(totpCodeSchema, { code: '' });
  const [formError, setFormError] = useState<string | null>(null);
  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      onSignedIn((await send.mutateAsync(values)).user);
    } catch (err) {
      if (err instanceof ApiError && err.code === 'sign-in-again') return onRestart(err.message);
      setFormError(applyServerErrors(form, err));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-labelledby="code-step-title">
      <h2 id="code-step-title" className="text-lg">
        One more step
      </h2>
      <p className="text-sm text-ink-soft">Your password is right. Open your authenticator app and enter its code.</p>
      {formError && <Alert tone="error">{formError}</Alert>}
      <TextField
        label="Code from your app"
        inputMode="numeric"
        autoComplete="one-time-code"
        autoFocus
        error={form.formState.errors.code?.message}
        {...form.register('code')}
      />
      <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
        Sign in
      </Button>
      <Button type="button" variant="quiet" onClick={() => onRestart()} className="w-full">
        Start again
      </Button>
    </form>
  );
}
