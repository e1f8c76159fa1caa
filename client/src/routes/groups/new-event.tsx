import { TZDate } from '@date-fns/tz';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { SKILLS } from '../../../../shared/constants';
import { generateSlots } from '../../../../shared/booking/slots';
import { GroupTabs } from '../../components/layouts/group-tabs';
import { Button } from '../../components/ui/button';
import { Alert, Card } from '../../components/ui/feedback';
import { SelectField, TextField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { useCreateEvent } from '../../features/events/api/create-event';
import { groupSettingsQuery } from '../../features/groups/api/get-group-settings';
import { venuesQuery } from '../../features/groups/api/get-venues';
import { queryClient } from '../../lib/query-client';
import { ApiError } from '../../lib/api';
import { useT } from '../../lib/i18n';

interface Values {
  title: string;
  venueId: string;
  date: string;
  from: string;
  to: string;
  slotMinutes: string;
  slotCapacity: string;
  description: string;
  limits: Record<string, string>;
}

/** Date and hours are typed in the group's own time zone and sent as instants. */
const instant = (date: string, time: string, zone: string) => {
  const [y, m, d] = date.split('-').map(Number);
  const [hh, mm] = time.split(':').map(Number);
  return new TZDate(y, m - 1, d, hh, mm, 0, zone).toISOString();
};

export const loader = ({ params }: LoaderFunctionArgs) => {
  const groupId = Number(params.groupId);
  return Promise.all([
    queryClient.ensureQueryData(groupSettingsQuery(groupId)),
    queryClient.ensureQueryData(venuesQuery(groupId)),
  ]);
};

export function NewEventPage() {
  const t = useT();
  const groupId = Number(useParams().groupId);
  const group = useSuspenseQuery(groupSettingsQuery(groupId));
  const venues = useSuspenseQuery(venuesQuery(groupId));
  const create = useCreateEvent();
  const navigate = useNavigate();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values>({
    defaultValues: {
      title: t('organise.newSession.defaultTitle'),
      venueId: '',
      date: '',
      from: '10:00',
      to: '13:00',
      slotMinutes: '30',
      slotCapacity: '4',
      description: '',
      limits: {},
    },
  });
  const errors = form.formState.errors;
  const v = form.watch();
  const zone = group.data.timeZone;

  let preview: string | null = null;
  try {
    if (v.date && v.from && v.to) {
      const from = new Date(instant(v.date, v.from, zone));
      const to = new Date(instant(v.date, v.to, zone));
      const cut = generateSlots(from, to, Number(v.slotMinutes), Number(v.slotCapacity));
      const n = cut.length;
      const rest = n ? Math.round((to.getTime() - cut[n - 1].endsAt.getTime()) / 60_000) : 0;
      preview =
        t('organise.newSession.preview', { n, minutes: v.slotMinutes, places: n * Number(v.slotCapacity) }) +
        (rest > 0 ? ` ${t('organise.newSession.previewRest', { rest })}` : '');
    }
  } catch (err) {
    preview = (err as Error).message;
  }

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    let missing = false;
    if (!values.venueId) {
      form.setError('venueId', { message: t('organise.newSession.chooseVenue') });
      missing = true;
    }
    if (!values.date) {
      form.setError('date', { message: t('organise.newSession.chooseDate') });
      missing = true;
    }
    if (missing) return;
    const skillLimits = Object.fromEntries(
      Object.entries(values.limits)
        .filter(([, n]) => n !== '')
        .map(([k, n]) => [k, Number(n)]),
    );
    try {
      const e = await create.mutateAsync({
        groupId,
        title: values.title,
        venueId: Number(values.venueId) || 0,
        description: values.description,
        startsAt: instant(values.date, values.from, zone),
        endsAt: instant(values.date, values.to, zone),
        slotMinutes: Number(values.slotMinutes),
        slotCapacity: Number(values.slotCapacity),
        skillLimits,
      });
      navigate(paths.manageEvent(e.id));
    } catch (err) {
      if (err instanceof ApiError) {
        const map: Record<string, keyof Values> = { startsAt: 'from', endsAt: 'to' };
        for (const [k, m] of Object.entries(err.fields ?? {}))
          form.setError((map[k] ?? k) as keyof Values, { message: m });
        setFormError(err.message);
      } else setFormError(t('organise.newSession.failed'));
    }
  });

  return (
    <div>
      <h1 className="mb-2 text-2xl sm:text-3xl">{t('organise.newSession.title')}</h1>
      <GroupTabs groupId={groupId} />
      <form onSubmit={onSubmit} noValidate className="max-w-2xl space-y-5">
        {formError && <Alert tone="error">{formError}</Alert>}
        <Card className="space-y-4">
          <TextField
            label={t('organise.newSession.titleLabel')}
            error={errors.title?.message}
            {...form.register('title')}
          />
          {venues.data.length === 0 ? (
            <Alert tone="caution">{t('organise.newSession.noVenue')}</Alert>
          ) : (
            <SelectField
              label={t('organise.newSession.venue')}
              error={errors.venueId?.message}
              {...form.register('venueId')}
            >
              <option value="">{t('organise.newSession.choose')}</option>
              {venues.data.map((x) => (
                <option key={x.id} value={x.id}>
                  {x.name}, {x.town}
                </option>
              ))}
            </SelectField>
          )}
          <div className="grid gap-4 sm:grid-cols-3">
            <TextField
              label={t('organise.newSession.date')}
              type="date"
              error={errors.date?.message}
              {...form.register('date')}
            />
            <TextField
              label={t('organise.newSession.opens')}
              type="time"
              error={errors.from?.message}
              {...form.register('from')}
            />
            <TextField
              label={t('organise.newSession.closes')}
              type="time"
              error={errors.to?.message}
              {...form.register('to')}
            />
          </div>
          <p className="text-sm text-ink-soft">{t('organise.newSession.zone', { zone })}</p>
        </Card>
        <Card className="space-y-4">
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField
              label={t('organise.newSession.slotMinutes')}
              type="number"
              min={5}
              step={5}
              error={errors.slotMinutes?.message}
              {...form.register('slotMinutes')}
            />
            <TextField
              label={t('organise.newSession.slotCapacity')}
              type="number"
              min={0}
              error={errors.slotCapacity?.message}
              {...form.register('slotCapacity')}
            />
          </div>
          {preview && (
            <p role="status" className="rounded-lg bg-paper px-3 py-2 text-sm font-semibold">
              {preview}
            </p>
          )}
          <details>
            <summary className="cursor-pointer font-semibold text-navy">{t('organise.newSession.limits')}</summary>
            <p className="mt-2 text-sm text-ink-soft">{t('organise.newSession.limitsHint')}</p>
            <div className="mt-2 grid grid-cols-2 gap-3 sm:grid-cols-3">
              {SKILLS.map((s) => (
                <TextField
                  key={s}
                  label={t(`common.skill.${s}`)}
                  type="number"
                  min={0}
                  {...form.register(`limits.${s}`)}
                />
              ))}
            </div>
          </details>
          <div className="space-y-1">
            <label htmlFor="desc" className="block font-semibold">
              {t('organise.newSession.note')}
            </label>
            <textarea
              id="desc"
              rows={3}
              className="block w-full rounded-lg border border-ink/20 bg-white px-3 py-2.5"
              {...form.register('description')}
            />
          </div>
        </Card>
        <Button type="submit" busy={form.formState.isSubmitting}>
          {t('organise.newSession.create')}
        </Button>
        <p className="text-sm text-ink-soft">{t('organise.newSession.draftHint')}</p>
      </form>
    </div>
  );
}
