import { useEffect, useMemo, useState } from 'react';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { SKILL_LABELS } from '../../../../shared/constants';
import { COMMON_CURRENCIES, currencyName, formatMoney } from '../../../../shared/format';
import { LANGUAGE_NAMES, LANGUAGES, type Language } from '../../../../shared/i18n/languages';
import { countryChoices } from '../../../../shared/places/countries';
import { venueSchema } from '../../../../shared/schemas/events';
import { GroupTabs } from '../../components/layouts/group-tabs';
import { PrivacySettings } from '../../features/groups/components/privacy-settings';
import { paths } from '../../config/paths';
import { Button } from '../../components/ui/button';
import { Alert, Card, Spinner } from '../../components/ui/feedback';
import { CheckField, TextField } from '../../components/ui/field';
import { useSharing } from '../../features/toolkit/api/get-sharing';
import { useSetSharing } from '../../features/toolkit/api/set-sharing';
import { categoriesQuery, useCategories } from '../../features/categories/api/get-categories';
import { useCreateVenue } from '../../features/groups/api/create-venue';
import { groupSettingsQuery } from '../../features/groups/api/get-group-settings';
import { useSaveGroupSettings } from '../../features/groups/api/save-group-settings';
import { venuesQuery } from '../../features/groups/api/get-venues';
import { eventKeys } from '../../features/events/api/keys';
import { queryClient } from '../../lib/query-client';
import { applyServerErrors, useZodForm } from '../../lib/form';

export const loader = ({ params }: LoaderFunctionArgs) => {
  const groupId = Number(params.groupId);
  return Promise.all([
    queryClient.ensureQueryData(groupSettingsQuery(groupId)),
    queryClient.ensureQueryData(categoriesQuery()),
    queryClient.ensureQueryData(venuesQuery(groupId)),
  ]);
};

export function GroupSettingsPage() {
  const groupId = Number(useParams().groupId);
  const settings = useSuspenseQuery(groupSettingsQuery(groupId));
  const categories = useCategories();
  const venues = useSuspenseQuery(venuesQuery(groupId));
  // The house rules and refused kinds are part of every event the group shows.
  const save = useSaveGroupSettings(groupId, () => queryClient.invalidateQueries({ queryKey: eventKeys.all }));
  const addVenue = useCreateVenue(groupId);
  const [rules, setRules] = useState('');
  const [excluded, setExcluded] = useState<Set<number>>(new Set());
  const venueForm = useZodForm(venueSchema, { groupId, name: '', address: '', town: '', accessNotes: '' });
  const [venueError, setVenueError] = useState<string | null>(null);
  useEffect(() => {
    setRules(settings.data.houseRules);
    setExcluded(new Set(settings.data.excludedCategoryIds));
  }, [settings.data]);
  const toggle = (id: number) => {
    save.reset();
    setExcluded((s) => {
      const n = new Set(s);
      if (n.has(id)) n.delete(id);
      else n.add(id);
      return n;
    });
  };

  return (
    <div>
      <h1 className="mb-2 text-2xl sm:text-3xl">{settings.data.name}</h1>
      <GroupTabs groupId={groupId} />
      <div className="grid gap-6 lg:grid-cols-2">
        <Card className="space-y-4">
          <h2 className="text-lg">House rules and what you take</h2>
          <div className="space-y-1">
            <label htmlFor="rules" className="block font-semibold">
              House rules (one per line)
            </label>
            <textarea
              id="rules"
              rows={Math.max(6, rules.split('\n').length + 4)}
              value={rules}
              onChange={(e) => {
                setRules(e.target.value);
                save.reset();
              }}
              className="block w-full rounded-lg border border-ink/20 bg-white px-3 py-2.5"
            />
            <p className="text-sm text-ink-soft">Visitors accept these when they book.</p>
          </div>
          <fieldset>
            <legend className="font-semibold">Categories you do not take</legend>
            <div className="mt-2 space-y-3">
              {Object.entries(SKILL_LABELS).map(([skill, label]) => {
                const list = categories.data.filter((c) => c.skill === skill);
                if (!list.length) return null;
                return (
                  <div key={skill}>
                    <p className="text-sm font-bold text-ink-soft">{label}</p>
                    {list.map((c) => (
                      <label key={c.id} className="flex items-start gap-2 py-0.5 text-sm">
                        <input
                          type="checkbox"
                          className="mt-0.5 size-4 accent-alert"
                          checked={excluded.has(c.id)}
                          onChange={() => toggle(c.id)}
                        />
                        <span>
                          {c.name}
                          {c.refusal && <span className="text-ink-soft"> — usually refused: {c.refusal.reason}</span>}
                        </span>
                      </label>
                    ))}
                  </div>
                );
              })}
            </div>
          </fieldset>
          {save.error && <Alert tone="error">{save.error.message}</Alert>}
          {save.isSuccess && <Alert tone="success">Saved.</Alert>}
          <Button
            busy={save.isPending}
            onClick={() => save.mutate({ houseRules: rules, excludedCategoryIds: [...excluded] })}
          >
            Save rules
          </Button>
        </Card>

        <PrivacySettings settings={settings.data} privacyPath={paths.groupPrivacy(groupId)} />

        <Card className="space-y-4">
          <h2 className="text-lg">Venues</h2>
          {venues.data.length === 0 && <p className="text-sm text-ink-soft">No venue yet: add the hall you meet in.</p>}
          <ul className="space-y-2">
            {venues.data.map((v) => (
              <li key={v.id} className="rounded-lg bg-paper p-3">
                <p className="font-bold">{v.name}</p>
                <p className="text-sm">
                  {v.address}, {v.town}
                </p>
                {v.accessNotes && <p className="text-sm text-ink-soft">{v.accessNotes}</p>}
              </li>
            ))}
          </ul>
          <form
            noValidate
            className="space-y-3 border-t border-ink/5 pt-4"
            onSubmit={venueForm.handleSubmit(async (v) => {
              setVenueError(null);
              try {
                await addVenue.mutateAsync({ ...v, groupId, accessNotes: v.accessNotes ?? '' });
                venueForm.reset({ groupId, name: '', address: '', town: '', accessNotes: '' });
              } catch (err) {
                setVenueError(applyServerErrors(venueForm, err));
              }
            })}
          >
            <h3 className="font-bold">Add a venue</h3>
            {venueError && <Alert tone="error">{venueError}</Alert>}
            <TextField label="Name" error={venueForm.formState.errors.name?.message} {...venueForm.register('name')} />
            <TextField
              label="Street address"
              error={venueForm.formState.errors.address?.message}
              {...venueForm.register('address')}
            />
            <TextField label="Town" error={venueForm.formState.errors.town?.message} {...venueForm.register('town')} />
            <TextField
              label="Access notes (optional)"
              hint="Steps, lifts, parking, where the sockets are."
              {...venueForm.register('accessNotes')}
            />
            <Button type="submit" variant="secondary" busy={venueForm.formState.isSubmitting}>
              Add venue
            </Button>
          </form>
        </Card>
        <CurrencyCard groupId={groupId} current={settings.data.currency} country={settings.data.country} />
        <LanguageCard groupId={groupId} current={settings.data.defaultLanguage} />
        <SharingCard groupId={groupId} />
      </div>
    </div>
  );
}

/** The group's country (for the open data file) and the currency its part costs are written and shown in. */
function CurrencyCard({
  groupId,
  current,
  country: savedCountry,
}: {
  groupId: number;
  current: string;
  country: string;
}) {
  const save = useSaveGroupSettings(groupId);
  const [currency, setCurrency] = useState(current);
  const [country, setCountry] = useState(savedCountry);
  useEffect(() => setCurrency(current), [current]);
  useEffect(() => setCountry(savedCountry), [savedCountry]);
  const countries = useMemo(() => countryChoices(), []);
  const codes = COMMON_CURRENCIES.includes(current as never) ? COMMON_CURRENCIES : [current, ...COMMON_CURRENCIES];
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">Country and money</h2>
      <div className="space-y-1">
        <label htmlFor="country" className="block font-semibold">
          Country
        </label>
        <select
          id="country"
          value={country}
          onChange={(e) => {
            setCountry(e.target.value);
            save.reset();
          }}
          className="block min-h-11 w-full rounded-lg border border-ink/20 bg-white px-3"
        >
          <option value="" disabled>
            Choose the country your sessions are in
          </option>
          {countries.map((c) => (
            <option key={c.code} value={c.code}>
              {c.name}
            </option>
          ))}
        </select>
        <p className="text-sm text-ink-soft">Written in the open repair data file that networks and funders read.</p>
      </div>
      <div className="space-y-1">
        <label htmlFor="currency" className="block font-semibold">
          Currency of part costs
        </label>
        <select
          id="currency"
          value={currency}
          onChange={(e) => {
            setCurrency(e.target.value);
            save.reset();
          }}
          className="block min-h-11 w-full rounded-lg border border-ink/20 bg-white px-3"
        >
          {codes.map((c) => (
            <option key={c} value={c}>
              {c} — {currencyName(c)}
            </option>
          ))}
        </select>
        <p className="text-sm text-ink-soft">
          Fixers note what a part should cost in it, and follow-up mails quote it: {formatMoney(12.5, currency)}.
        </p>
      </div>
      {save.error && <Alert tone="error">{save.error.message}</Alert>}
      {save.isSuccess && <Alert tone="success">Saved.</Alert>}
      <Button
        variant="secondary"
        busy={save.isPending}
        onClick={() => save.mutate(country ? { currency, country } : { currency })}
      >
        Save country and currency
      </Button>
    </Card>
  );
}

/** The language of the group's mails when the visitor's own is not known: walk-ins registered at the desk. */
function LanguageCard({ groupId, current }: { groupId: number; current: Language }) {
  const save = useSaveGroupSettings(groupId);
  const [language, setLanguage] = useState(current);
  useEffect(() => setLanguage(current), [current]);
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">Language</h2>
      <div className="space-y-1">
        <label htmlFor="group-language" className="block font-semibold">
          Language of the group’s mails
        </label>
        <select
          id="group-language"
          value={language}
          onChange={(e) => {
            setLanguage(e.target.value as Language);
            save.reset();
          }}
          className="block min-h-11 w-full rounded-lg border border-ink/20 bg-white px-3"
        >
          {LANGUAGES.map((l) => (
            <option key={l} value={l} lang={l}>
              {LANGUAGE_NAMES[l]}
            </option>
          ))}
        </select>
        <p className="text-sm text-ink-soft">
          A visitor who books online gets every mail in the language they booked in. Visitors registered at the desk get
          this one.
        </p>
      </div>
      {save.error && <Alert tone="error">{save.error.message}</Alert>}
      {save.isSuccess && <Alert tone="success">Saved.</Alert>}
      <Button variant="secondary" busy={save.isPending} onClick={() => save.mutate({ defaultLanguage: language })}>
        Save the language
      </Button>
    </Card>
  );
}

/** Whether other groups may search this group's repair notes (its own fixers always can). */
function SharingCard({ groupId }: { groupId: number }) {
  const sharing = useSharing(groupId);
  const set = useSetSharing(groupId);
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">Repair notes</h2>
      <p className="text-sm text-ink-soft">
        Your fixers’ repair notes, and the fixes they add, are always searchable by your own volunteers. Sharing lets
        the other groups on Mendery search them too; no visitor’s name is ever in them.
      </p>
      {sharing.isPending ? (
        <Spinner />
      ) : sharing.error ? (
        <Alert tone="error">{sharing.error.message}</Alert>
      ) : (
        <CheckField
          label="Share our repair notes with the other groups"
          checked={sharing.data.share}
          disabled={set.isPending}
          onChange={(e) => set.mutate(e.target.checked)}
        />
      )}
      {set.error && <Alert tone="error">{set.error.message}</Alert>}
    </Card>
  );
}
