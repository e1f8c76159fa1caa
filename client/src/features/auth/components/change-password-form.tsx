import { useState } from 'react';
import { changePasswordSchema } from '../../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { Alert } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors, useZodForm } from '../../../lib/form';
import { useChangePassword } from '../api/change-password';
import { useT } from '../../../lib/i18n';

/** The current password, then the new one twice; other devices are signed out when it is saved. */
export function ChangePasswordForm() {
  const t = useT();
  const change = useChangePassword();
  const form = useZodForm(changePasswordSchema, { currentPassword: '', password: '', confirm: '' });
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setDone(null);
    try {
      const { message } = await change.mutateAsync(values);
      form.reset({ currentPassword: '', password: '', confirm: '' });
      setDone(message);
    } catch (err) {
      setFormError(applyServerErrors(form, err));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-labelledby="change-password-title">
      <h3 id="change-password-title" className="font-bold text-navy">
        {t('account.change.title')}
      </h3>
      {formError && <Alert tone="error">{formError}</Alert>}
      {done && <Alert tone="success">{done}</Alert>}
      <TextField
        label={t('account.change.current')}
        type="password"
        autoComplete="current-password"
        error={form.formState.errors.currentPassword?.message}
        {...form.register('currentPassword')}
      />
      <TextField
        label={t('account.newPassword')}
        type="password"
        autoComplete="new-password"
        hint={t('account.change.hint')}
        error={form.formState.errors.password?.message}
        {...form.register('password')}
      />
      <TextField
        label={t('account.change.again')}
        type="password"
        autoComplete="new-password"
        error={form.formState.errors.confirm?.message}
        {...form.register('confirm')}
      />
      <Button type="submit" busy={form.formState.isSubmitting}>
        {t('account.saveNewPassword')}
      </Button>
    </form>
  );
}
