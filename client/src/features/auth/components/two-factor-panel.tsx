import { useState } from 'react';
import { totpCodeSchema, turnOffTwoFactorSchema } from '../../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { Alert, Spinner } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors, useZodForm } from '../../../lib/form';
import { useDisableTwoFactor, useEnableTwoFactor, useStartTwoFactor, useTwoFactorStatus } from '../api/two-factor';

/** Two-step sign-in for admins: set up with an authenticator app, or turn off with the password and a code. */
export function TwoFactorPanel() {
  const status = useTwoFactorStatus();
  const [done, setDone] = useState<string | null>(null);
  if (status.isPending) return <Spinner label="Loading two-step sign-in…" />;
  if (status.isError)
    return <Alert tone="error">Two-step sign-in could not be loaded. Reload the page to try again.</Alert>;
  if (!status.data.available && !status.data.enabled) return null;
  return (
    <section className="space-y-3 border-t border-ink/5 pt-4" aria-labelledby="two-factor-title">
      <h3 id="two-factor-title" className="font-bold text-navy">
        Two-step sign-in
      </h3>
      {done && <Alert tone="success">{done}</Alert>}
      {status.data.enabled ? <TurnOff onDone={setDone} /> : <SetUp onDone={setDone} />}
    </section>
  );
}

function SetUp({ onDone }: { onDone: (message: string) => void }) {
  const start = useStartTwoFactor();
  const enable = useEnableTwoFactor();
  const form = useZodForm(totpCodeSchema, { code: '' });
  const [formError, setFormError] = useState<string | null>(null);
  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      onDone((await enable.mutateAsync(values)).message);
    } catch (err) {
      setFormError(applyServerErrors(form, err));
    }
  });
  if (!start.data)
    return (
      <div className="space-y-3">
        <p className="text-sm text-ink-soft">
          Off. With it on, signing in asks for a code from an authenticator app on your phone after your password, so a
          leaked password alone does not open the admin pages.
        </p>
        {start.error && <Alert tone="error">{start.error.message}</Alert>}
        <Button variant="secondary" busy={start.isPending} onClick={() => start.mutate()}>
          Set up two-step sign-in
        </Button>
      </div>
    );
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Set up two-step sign-in">
      <p className="text-sm">1. Scan this code with your authenticator app, or type the key below into it.</p>
      <img
        src={start.data.qr}
        alt="QR code that adds your Mendery account to an authenticator app"
        width={200}
        height={200}
        className="rounded-lg ring-1 ring-ink/10"
      />
      <p className="text-sm">
        Key:{' '}
        <code className="rounded bg-paper px-1 font-bold break-all" data-testid="totp-key">
          {start.data.secret}
        </code>
      </p>
      <p className="text-sm">2. Enter the code the app shows, to check it works. Two-step sign-in is on only then.</p>
      {formError && <Alert tone="error">{formError}</Alert>}
      <TextField
        label="Code from your app"
        inputMode="numeric"
        autoComplete="one-time-code"
        error={form.formState.errors.code?.message}
        {...form.register('code')}
      />
      <Button type="submit" busy={form.formState.isSubmitting}>
        Turn on two-step sign-in
      </Button>
    </form>
  );
}

function TurnOff({ onDone }: { onDone: (message: string) => void }) {
  const disable = useDisableTwoFactor();
  const form = useZodForm(turnOffTwoFactorSchema, { password: '', code: '' });
  const [formError, setFormError] = useState<string | null>(null);
  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      onDone((await disable.mutateAsync(values)).message);
    } catch (err) {
      setFormError(applyServerErrors(form, err));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Turn off two-step sign-in">
      <p className="text-sm text-ink-soft">On: signing in asks for a code from your authenticator app.</p>
      {formError && <Alert tone="error">{formError}</Alert>}
      <TextField
        label="Your password"
        type="password"
        autoComplete="current-password"
        error={form.formState.errors.password?.message}
        {...form.register('password')}
      />
      <TextField
        label="Code from your app"
        inputMode="numeric"
        autoComplete="one-time-code"
        error={form.formState.errors.code?.message}
        {...form.register('code')}
      />
      <Button type="submit" variant="danger" busy={form.formState.isSubmitting}>
        Turn off two-step sign-in
      </Button>
    </form>
  );
}
