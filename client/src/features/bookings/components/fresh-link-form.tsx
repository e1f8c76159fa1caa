import { useId, useState } from 'react';
import { freshLinkSchema } from '../../../../../shared/schemas/bookings';
import { Button } from '../../../components/ui/button';
import { Alert } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors, useZodForm } from '../../../lib/form';
import { useRequestFreshLink } from '../api/request-fresh-link';
import { useT } from '../../../lib/i18n';

/**
 * Asks for a fresh link to one's bookings by e-mail. The page says the same whatever the address, so nobody learns
 * from it whether an address has bookings.
 */
export function FreshLinkForm({ title }: { title?: string }) {
  const t = useT();
  const request = useRequestFreshLink();
  const form = useZodForm(freshLinkSchema, { email: '' });
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const titleId = useId();
  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setDone(null);
    try {
      await request.mutateAsync(values);
      setDone(t('booking.fresh.sent', { email: values.email }));
    } catch (err) {
      setFormError(applyServerErrors(form, err));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-labelledby={titleId}>
      <h2 id={titleId} className="text-lg">
        {title ?? t('booking.fresh.title')}
      </h2>
      <p className="text-sm text-ink-soft">{t('booking.fresh.lead')}</p>
      {formError && <Alert tone="error">{formError}</Alert>}
      {done && <Alert tone="success">{done}</Alert>}
      <TextField
        label={t('booking.fresh.email')}
        type="email"
        autoComplete="email"
        error={form.formState.errors.email?.message}
        {...form.register('email')}
      />
      <Button type="submit" busy={form.formState.isSubmitting}>
        {t('booking.fresh.submit')}
      </Button>
    </form>
  );
}
