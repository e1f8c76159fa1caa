import { useState } from 'react';
import type { SessionUser } from '../../../../../shared/schemas/auth';
import { totpCodeSchema } from '../../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { Alert } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { ApiError } from '../../../lib/api';
import { applyServerErrors, useZodForm } from '../../../lib/form';
import { useSignInCode } from '../api/two-factor';
import { useT } from '../../../lib/i18n';

/** The second step of signing in: the 6 digits from the person's authenticator app. */
export function SignInCodeForm({
  onSignedIn,
  onRestart,
}: {
  onSignedIn: (u: SessionUser) => void;
  onRestart: (why?: string) => void;
}) {
  const t = useT();
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
        {t('account.code.title')}
      </h2>
      <p className="text-sm text-ink-soft">{t('account.code.lead')}</p>
      {formError && <Alert tone="error">{formError}</Alert>}
      <TextField
        label={t('account.code')}
        inputMode="numeric"
        autoComplete="one-time-code"
        autoFocus
        error={form.formState.errors.code?.message}
        {...form.register('code')}
      />
      <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
        {t('account.signIn.submit')}
      </Button>
      <Button type="button" variant="quiet" onClick={() => onRestart()} className="w-full">
        {t('account.code.restart')}
      </Button>
    </form>
  );
}
