import { useEffect, useMemo, useState } from 'react';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { SKILLS } from '../../../../shared/constants';
import { COMMON_CURRENCIES, currencyName, formatMoney, intlLocale } from '../../../../shared/format';
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
import { tr, useLanguage, useT } from '../../lib/i18n';

export const loader = ({ params }: LoaderFunctionArgs) => {
  const groupId = Number(params.groupId);
  return Promise.all([
    queryClient.ensureQueryData(groupSettingsQuery(groupId)),
    queryClient.ensureQueryData(categoriesQuery()),
    queryClient.ensureQueryData(venuesQuery(groupId)),
  ]);
};

export function GroupSettingsPage() {
  const t = useT();
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
          <h2 className="text-lg">{t('organise.settings.rulesTitle')}</h2>
          <div className="space-y-1">
            <label htmlFor="rules" className="block font-semibold">
              {t('organise.settings.rules')}
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
            <p className="text-sm text-ink-soft">{t('organise.settings.rulesHint')}</p>
          </div>
          <fieldset>
            <legend className="font-semibold">{t('organise.settings.notTaken')}</legend>
            <div className="mt-2 space-y-3">
              {SKILLS.map((skill) => {
                const list = categories.data.filter((c) => c.skill === skill);
                if (!list.length) return null;
                return (
                  <div key={skill}>
                    <p className="text-sm font-bold text-ink-soft">{t(`common.skill.${skill}`)}</p>
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
                          {c.refusal && (
                            <span className="text-ink-soft">
                              {' '}
                              — {t('organise.settings.usuallyRefused', { reason: c.refusal.reason })}
                            </span>
                          )}
                        </span>
                      </label>
                    ))}
                  </div>
                );
              })}
            </div>
          </fieldset>
          {save.error && <Alert tone="error">{tr(save.error.message)}</Alert>}
          {save.isSuccess && <Alert tone="success">{t('organise.manage.saved')}</Alert>}
          <Button
            busy={save.isPending}
            onClick={() => save.mutate({ houseRules: rules, excludedCategoryIds: [...excluded] })}
          >
            {t('organise.settings.saveRules')}
          </Button>
        </Card>

        <PrivacySettings settings={settings.data} privacyPath={paths.groupPrivacy(groupId)} />

        <Card className="space-y-4">
          <h2 className="text-lg">{t('organise.settings.venues')}</h2>
          {venues.data.length === 0 && <p className="text-sm text-ink-soft">{t('organise.settings.noVenue')}</p>}
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
            <h3 className="font-bold">{t('organise.settings.addVenueTitle')}</h3>
            {venueError && <Alert tone="error">{tr(venueError)}</Alert>}
            <TextField
              label={t('organise.settings.venueName')}
              error={venueForm.formState.errors.name?.message}
              {...venueForm.register('name')}
            />
            <TextField
              label={t('organise.settings.address')}
              error={venueForm.formState.errors.address?.message}
              {...venueForm.register('address')}
            />
            <TextField
              label={t('organise.settings.town')}
              error={venueForm.formState.errors.town?.message}
              {...venueForm.register('town')}
            />
            <TextField
              label={t('organise.settings.access')}
              hint={t('organise.settings.accessHint')}
              {...venueForm.register('accessNotes')}
            />
            <Button type="submit" variant="secondary" busy={venueForm.formState.isSubmitting}>
              {t('organise.settings.addVenue')}
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
  const t = useT();
  const lang = useLanguage();
  const save = useSaveGroupSettings(groupId);
  const [currency, setCurrency] = useState(current);
  const [country, setCountry] = useState(savedCountry);
  useEffect(() => setCurrency(current), [current]);
  useEffect(() => setCountry(savedCountry), [savedCountry]);
  const countries = useMemo(() => countryChoices(intlLocale(lang)), [lang]);
  const codes = COMMON_CURRENCIES.includes(current as never) ? COMMON_CURRENCIES : [current, ...COMMON_CURRENCIES];
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">{t('organise.settings.moneyTitle')}</h2>
      <div className="space-y-1">
        <label htmlFor="country" className="block font-semibold">
          {t('organise.settings.country')}
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
            {t('organise.settings.chooseCountry')}
          </option>
          {countries.map((c) => (
            <option key={c.code} value={c.code}>
              {c.name}
            </option>
          ))}
        </select>
        <p className="text-sm text-ink-soft">{t('organise.settings.countryHint')}</p>
      </div>
      <div className="space-y-1">
        <label htmlFor="currency" className="block font-semibold">
          {t('organise.settings.currency')}
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
              {c} — {currencyName(c, lang)}
            </option>
          ))}
        </select>
        <p className="text-sm text-ink-soft">
          {t('organise.settings.currencyHint', { example: formatMoney(12.5, currency, lang) })}
        </p>
      </div>
      {save.error && <Alert tone="error">{tr(save.error.message)}</Alert>}
      {save.isSuccess && <Alert tone="success">{t('organise.manage.saved')}</Alert>}
      <Button
        variant="secondary"
        busy={save.isPending}
        onClick={() => save.mutate(country ? { currency, country } : { currency })}
      >
        {t('organise.settings.saveMoney')}
      </Button>
    </Card>
  );
}

/** The language of the group's mails when the visitor's own is not known: walk-ins registered at the desk. */
function LanguageCard({ groupId, current }: { groupId: number; current: Language }) {
  const t = useT();
  const save = useSaveGroupSettings(groupId);
  const [language, setLanguage] = useState(current);
  useEffect(() => setLanguage(current), [current]);
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">{t('organise.settings.languageTitle')}</h2>
      <div className="space-y-1">
        <label htmlFor="group-language" className="block font-semibold">
          {t('organise.settings.language')}
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
        <p className="text-sm text-ink-soft">{t('organise.settings.languageHint')}</p>
      </div>
      {save.error && <Alert tone="error">{tr(save.error.message)}</Alert>}
      {save.isSuccess && <Alert tone="success">{t('organise.manage.saved')}</Alert>}
      <Button variant="secondary" busy={save.isPending} onClick={() => save.mutate({ defaultLanguage: language })}>
        {t('organise.settings.saveLanguage')}
      </Button>
    </Card>
  );
}

/** Whether other groups may search this group's repair notes (its own fixers always can). */
function SharingCard({ groupId }: { groupId: number }) {
  const t = useT();
  const sharing = useSharing(groupId);
  const set = useSetSharing(groupId);
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">{t('organise.settings.notesTitle')}</h2>
      <p className="text-sm text-ink-soft">{t('organise.settings.notesLead')}</p>
      {sharing.isPending ? (
        <Spinner />
      ) : sharing.error ? (
        <Alert tone="error">{tr(sharing.error.message)}</Alert>
      ) : (
        <CheckField
          label={t('organise.settings.share')}
          checked={sharing.data.share}
          disabled={set.isPending}
          onChange={(e) => set.mutate(e.target.checked)}
        />
      )}
      {set.error && <Alert tone="error">{tr(set.error.message)}</Alert>}
    </Card>
  );
}
