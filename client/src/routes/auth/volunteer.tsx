import { useState } from 'react';
import { Link } from 'react-router';
import { signupSchema } from '../../../../shared/schemas/auth';
import { Button } from '../../components/ui/button';
import { Alert, Card, PageTitle, Spinner } from '../../components/ui/feedback';
import { SelectField, TextField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { useSignUp } from '../../features/auth/api/sign-up';
import { usePublicGroups, publicGroupsQuery } from '../../features/groups/api/get-public-groups';
import { applyServerErrors, useZodForm } from '../../lib/form';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = () => queryClient.ensureQueryData(publicGroupsQuery()).catch(() => null);

export function VolunteerPage() {
  const groups = usePublicGroups();
  const signUp = useSignUp();
  const form = useZodForm(signupSchema, { name: '', email: '', password: '', role: 'fixer' });
  const [formError, setFormError] = useState<string | null>(null);
  const errors = form.formState.errors;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await signUp.mutateAsync(values);
    } catch (err) {
      setFormError(applyServerErrors(form, err));
    }
  });

  if (signUp.isSuccess) {
    return (
      <Card className="mx-auto max-w-lg">
        <h1 className="text-2xl">Check your mail</h1>
        <p className="mt-2">
          {signUp.data.message} Once you have confirmed it, an organiser of the group confirms your place.
        </p>
        <Link to={paths.signIn()} className="mt-4 inline-block font-bold text-navy underline">
          Go to sign-in
        </Link>
      </Card>
    );
  }

  return (
    <div className="mx-auto max-w-lg">
      <PageTitle
        title="Volunteer with a repair group"
        lead="Fixers diagnose and mend alongside visitors; reception welcomes people and keeps the queue moving. No experience with every kind of item is needed."
      />
      <Card>
        {groups.isPending ? (
          <Spinner label="Loading groups…" />
        ) : groups.data?.length === 0 ? (
          <Alert>No repair group has joined Mendery yet, so there is nobody to volunteer with.</Alert>
        ) : (
          <form onSubmit={onSubmit} noValidate className="space-y-4">
            {formError && <Alert tone="error">{formError}</Alert>}
            <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register('name')} />
            <TextField
              label="E-mail"
              type="email"
              autoComplete="email"
              error={errors.email?.message}
              {...form.register('email')}
            />
            <TextField
              label="Password"
              type="password"
              autoComplete="new-password"
              hint="At least 10 characters."
              error={errors.password?.message}
              {...form.register('password')}
            />
            <SelectField label="Group" error={errors.groupId?.message} defaultValue="" {...form.register('groupId')}>
              <option value="" disabled>
                Choose a group…
              </option>
              {groups.data?.map((g) => (
                <option key={g.id} value={g.id}>
                  {g.name} — {g.town}
                </option>
              ))}
            </SelectField>
            <fieldset className="space-y-2">
              <legend className="font-semibold">How would you like to help?</legend>
              {[
                ['fixer', 'As a fixer', 'Repair items with visitors at a bench.'],
                ['host', 'At reception', 'Welcome visitors, check them in and tag their items.'],
              ].map(([value, label, text]) => (
                <label
                  key={value}
                  className="flex cursor-pointer gap-3 rounded-lg p-3 ring-1 ring-ink/15 has-checked:ring-2 has-checked:ring-copper"
                >
                  <input type="radio" value={value} className="mt-1 accent-copper" {...form.register('role')} />
                  <span>
                    <span className="block font-bold">{label}</span>
                    <span className="text-sm text-ink-soft">{text}</span>
                  </span>
                </label>
              ))}
              {errors.role && <p className="text-sm font-semibold text-alert">{errors.role.message}</p>}
            </fieldset>
            <Button type="submit" busy={form.formState.isSubmitting} className="w-full">
              Sign up
            </Button>
          </form>
        )}
      </Card>
    </div>
  );
}
