import { useId, useState } from 'react';
import { freshLinkSchema } from '../../../../../shared/schemas/bookings';
import { Button } from '../../../components/ui/button';
import { Alert } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors, useZodForm } from '../../../lib/form';
import { useRequestFreshLink } from '../api/request-fresh-link';

/**
 * Asks for a fresh link to one's bookings by e-mail. The page says the same whatever the address, so nobody learns
 * from it whether an address has bookings.
 */
export function FreshLinkForm({ title = 'Get a fresh link by e-mail' }: { title?: string }) {
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
      setDone(
        `If ${values.email} has a booking for a session coming up or just past, a fresh link is on its way. Links mailed before stop working.`,
      );
    } catch (err) {
      setFormError(applyServerErrors(form, err));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-labelledby={titleId}>
      <h2 id={titleId} className="text-lg">
        {title}
      </h2>
      <p className="text-sm text-ink-soft">
        Type the e-mail address you booked with. We mail a new link for each of its bookings; the old links then stop
        working.
      </p>
      {formError && <Alert tone="error">{formError}</Alert>}
      {done && <Alert tone="success">{done}</Alert>}
      <TextField
        label="Your e-mail address"
        type="email"
        autoComplete="email"
        error={form.formState.errors.email?.message}
        {...form.register('email')}
      />
      <Button type="submit" busy={form.formState.isSubmitting}>
        Mail me a fresh link
      </Button>
    </form>
  );
}
