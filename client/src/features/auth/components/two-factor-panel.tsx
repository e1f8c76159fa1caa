import { useState } from 'react';
import { totpCodeSchema, turnOffTwoFactorSchema } from '../../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { Alert, Spinner } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors, useZodForm } from '../../../lib/form';
import { useDisableTwoFactor, useEnableTwoFactor, useStartTwoFactor, useTwoFactorStatus } from '../api/two-factor';
import { useT } from '../../../lib/i18n';

/** Two-step sign-in for admins: set up with an authenticator app, or turn off with the password and a code. */
export function TwoFactorPanel() {
  const t = useT();
  const status = useTwoFactorStatus();
  const [done, setDone] = useState<string | null>(null);
  if (status.isPending) return <Spinner label={t('account.twoStep.loading')} />;
  if (status.isError) return <Alert tone="error">{t('account.twoStep.loadFailed')}</Alert>;
  if (!status.data.available && !status.data.enabled) return null;
  return (
    <section className="space-y-3 border-t border-ink/5 pt-4" aria-labelledby="two-factor-title">
      <h3 id="two-factor-title" className="font-bold text-navy">
        {t('account.twoStep.title')}
      </h3>
      {done && <Alert tone="success">{done}</Alert>}
      {status.data.enabled ? <TurnOff onDone={setDone} /> : <SetUp onDone={setDone} />}
    </section>
  );
}

function SetUp({ onDone }: { onDone: (message: string) => void }) {
  const t = useT();
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
        <p className="text-sm text-ink-soft">{t('account.twoStep.offLead')}</p>
        {start.error && <Alert tone="error">{start.error.message}</Alert>}
        <Button variant="secondary" busy={start.isPending} onClick={() => start.mutate()}>
          {t('account.twoStep.setUp')}
        </Button>
      </div>
    );
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label={t('account.twoStep.setUp')}>
      <p className="text-sm">{t('account.twoStep.scan')}</p>
      <img
        src={start.data.qr}
        alt={t('account.twoStep.qrAlt')}
        width={200}
        height={200}
        className="rounded-lg ring-1 ring-ink/10"
      />
      <p className="text-sm">
        {t('account.twoStep.key')}{' '}
        <code className="rounded bg-paper px-1 font-bold break-all" data-testid="totp-key">
          {start.data.secret}
        </code>
      </p>
      <p className="text-sm">{t('account.twoStep.check')}</p>
      {formError && <Alert tone="error">{formError}</Alert>}
      <TextField
        label={t('account.code')}
        inputMode="numeric"
        autoComplete="one-time-code"
        error={form.formState.errors.code?.message}
        {...form.register('code')}
      />
      <Button type="submit" busy={form.formState.isSubmitting}>
        {t('account.twoStep.turnOn')}
      </Button>
    </form>
  );
}

function TurnOff({ onDone }: { onDone: (message: string) => void }) {
  const t = useT();
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
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label={t('account.twoStep.turnOff')}>
      <p className="text-sm text-ink-soft">{t('account.twoStep.onLead')}</p>
      {formError && <Alert tone="error">{formError}</Alert>}
      <TextField
        label={t('account.twoStep.yourPassword')}
        type="password"
        autoComplete="current-password"
        error={form.formState.errors.password?.message}
        {...form.register('password')}
      />
      <TextField
        label={t('account.code')}
        inputMode="numeric"
        autoComplete="one-time-code"
        error={form.formState.errors.code?.message}
        {...form.register('code')}
      />
      <Button type="submit" variant="danger" busy={form.formState.isSubmitting}>
        {t('account.twoStep.turnOff')}
      </Button>
    </form>
  );
}
