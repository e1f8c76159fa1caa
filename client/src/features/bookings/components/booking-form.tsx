import { useMemo, useRef, useState } from 'react';
import { useFieldArray } from 'react-hook-form';
import { useNavigate, useSearchParams } from 'react-router';
import { HAZARDS, SKILLS } from '../../../../../shared/constants';
import { formatDay } from '../../../../../shared/format';
import { slotBookability } from '../../../../../shared/booking/bookability';
import { screenItem } from '../../../../../shared/booking/screening';
import { createBookingSchema, MAX_ITEMS_PER_BOOKING, PHOTO_LIMITS } from '../../../../../shared/schemas/bookings';
import type { Category } from '../../../../../shared/api/categories';
import type { EventDetail } from '../../../../../shared/api/events';
import { Button } from '../../../components/ui/button';
import { Alert, Card, PageTitle } from '../../../components/ui/feedback';
import { SelectField, TextField } from '../../../components/ui/field';
import { CheckGroup } from '../../../components/ui/check-group';
import { paths } from '../../../config/paths';
import { ApiError } from '../../../lib/api';
import { applyServerErrors, useZodForm } from '../../../lib/form';
import { tr, useLanguage, useT } from '../../../lib/i18n';
import { slotWords } from './slot-words';
import { WaitlistJoined } from './waitlist-joined';
import { HouseRules } from './house-rules';
import { TimeTiles } from './time-tiles';
import { useCreateBooking } from '../api/create-booking';
import { useJoinWaitlist } from '../api/join-waitlist';
import { refusalWords } from '../../../lib/refusal-words';
import { uploadPhotos } from '../api/upload-photos';

const emptyItem = { categoryId: '' as unknown as number, brand: '', model: '', fault: '', hazards: [] as never[] };

/**
 * The booking form with its validation (react-hook-form and the shared zod schema): its own chunk, which the booking
 * page loads while it already shows the session, so a phone is not kept waiting for the form's code.
 */
export function BookingForm({
  event,
  categories,
  onBooked,
}: {
  event: EventDetail;
  categories: Category[];
  onBooked: () => unknown;
}) {
  const t = useT();
  const lang = useLanguage();
  const hazardQuestions = HAZARDS.map((h) => ({ value: h, label: t(`booking.hazard.${h}.question`) }));
  const navigate = useNavigate();
  const key = useRef(crypto.randomUUID()).current;
  const book = useCreateBooking(key, onBooked);
  const waitlist = useJoinWaitlist(event.id);
  const tz = event.timeZone;
  const [search] = useSearchParams();
  const preselected = event.slots.find((s) => s.id === Number(search.get('slot')));
  const errorRef = useRef<HTMLDivElement>(null);
  const form = useZodForm(createBookingSchema, {
    slotId: preselected?.id,
    visitor: { name: '', email: '', phone: '' },
    items: [emptyItem],
    consent: false as never,
  });
  const items = useFieldArray({ control: form.control, name: 'items' });
  const [photos, setPhotos] = useState<Record<string, File[]>>({});
  const [photoErrors, setPhotoErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [progress, setProgress] = useState<string | null>(null);
  const [queued, setQueued] = useState<number | null>(null);
  const errors = form.formState.errors;
  const excluded = new Set(event.excludedCategoryIds);
  const byId = useMemo(() => new Map(categories.map((c) => [c.id, c])), [categories]);
  const slotId = Number(form.watch('slotId'));
  const chosen = event.slots.find((s) => s.id === slotId);
  const watchedItems = form.watch('items');
  // The shared rule the server decides with, for the kinds chosen so far: each tile shows what is true for them.
  const skills = watchedItems.flatMap((it) => byId.get(Number(it?.categoryId))?.skill ?? []);
  const now = new Date();
  const bookability = (s: (typeof event.slots)[number]) =>
    slotBookability({ ...s, skillLimits: event.skillLimits }, skills.length ? skills : [], now);
  const chosenState = chosen && bookability(chosen);
  const joinsWaitlist = chosenState ? !chosenState.ok && chosenState.reason === 'full' : false;
  const chosenRefused = chosenState && !chosenState.ok && chosenState.reason !== 'full' ? chosenState : null;

  const pickPhotos = (fieldId: string, list: FileList | null) => {
    const files = Array.from(list ?? []).slice(0, PHOTO_LIMITS.perItem);
    const bad = files.find(
      (f) => !(PHOTO_LIMITS.types as readonly string[]).includes(f.type) || f.size > PHOTO_LIMITS.maxBytes,
    );
    setPhotoErrors((e) => ({
      ...e,
      [fieldId]: bad
        ? t(bad.size > PHOTO_LIMITS.maxBytes ? 'booking.photo.tooLarge' : 'booking.photo.badType', { name: bad.name })
        : (list?.length ?? 0) > PHOTO_LIMITS.perItem
          ? t('booking.photo.tooMany', { max: PHOTO_LIMITS.perItem })
          : '',
    }));
    setPhotos((p) => ({ ...p, [fieldId]: files.filter((f) => f !== bad) }));
  };

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      if (joinsWaitlist) {
        const r = await waitlist.mutateAsync(values);
        setQueued(r.position);
        return;
      }
      setProgress(t('booking.progress.booking'));
      const created = await book.mutateAsync(values);
      const failed: string[] = [];
      for (const [i, field] of items.fields.entries()) {
        const files = photos[field.id] ?? [];
        if (!files.length) continue;
        setProgress(t('booking.progress.photos', { n: i + 1 }));
        try {
          await uploadPhotos(created.reference, created.manageToken, created.itemIds[i], files);
        } catch (err) {
          failed.push(err instanceof ApiError ? err.message : t('booking.photo.failed'));
        }
      }
      navigate(paths.booking(created.reference, created.manageToken, true), { state: { photoProblems: failed } });
    } catch (err) {
      setProgress(null);
      setFormError(applyServerErrors(form, err));
      // On a phone the message would be far above the button: bring it into view.
      requestAnimationFrame(() => errorRef.current?.scrollIntoView({ behavior: 'smooth', block: 'center' }));
    }
  });

  if (queued !== null)
    return (
      <WaitlistJoined
        position={queued}
        slot={chosen}
        day={event.startsAt}
        timeZone={tz}
        backTo={paths.event(event.id)}
      />
    );

  return (
    <div className="mx-auto max-w-2xl">
      <PageTitle
        title={t('booking.title')}
        lead={`${event.title} · ${formatDay(event.startsAt, tz, lang)} · ${event.venue.name}, ${event.venue.town}`}
      />
      <form onSubmit={onSubmit} noValidate className="space-y-6">
        {formError && (
          <div ref={errorRef} tabIndex={-1}>
            <Alert tone="error">{formError}</Alert>
          </div>
        )}

        <Card>
          <fieldset>
            <legend className="text-lg font-extrabold text-navy">{t('booking.step.time', { n: 1 })}</legend>
            <TimeTiles
              slots={event.slots}
              timeZone={tz}
              now={now}
              chosenId={slotId}
              bookability={bookability}
              field={form.register('slotId')}
            />
            {errors.slotId?.message && (
              <p className="mt-2 text-sm font-semibold text-alert">{tr(errors.slotId.message)}</p>
            )}
            {chosenRefused && (
              <div className="mt-3">
                <Alert tone="error">{slotWords(chosenRefused, t).message}</Alert>
              </div>
            )}
            {joinsWaitlist && (
              <div className="mt-3">
                <Alert tone="caution">{t('booking.waitlistHint', { count: watchedItems.length })}</Alert>
              </div>
            )}
          </fieldset>
        </Card>

        <Card>
          <fieldset className="space-y-4">
            <legend className="text-lg font-extrabold text-navy">{t('booking.step.you', { n: 2 })}</legend>
            <TextField
              label={t('booking.name')}
              autoComplete="name"
              error={errors.visitor?.name?.message}
              {...form.register('visitor.name')}
            />
            <TextField
              label={t('booking.email')}
              type="email"
              autoComplete="email"
              inputMode="email"
              hint={t('booking.emailHint')}
              error={errors.visitor?.email?.message}
              {...form.register('visitor.email')}
            />
            <TextField
              label={t('booking.phone')}
              type="tel"
              autoComplete="tel"
              inputMode="tel"
              error={errors.visitor?.phone?.message}
              {...form.register('visitor.phone')}
            />
          </fieldset>
        </Card>

        {items.fields.map((field, i) => {
          const cat = byId.get(Number(watchedItems[i]?.categoryId));
          // The booking's screening of the kind alone: the hazards below have their own notice.
          const screened = cat
            ? screenItem(cat, [], { name: event.groupName, excludedCategoryIds: event.excludedCategoryIds })
            : null;
          const hazards = watchedItems[i]?.hazards ?? [];
          const itemErrors = errors.items?.[i];
          return (
            <Card key={field.id}>
              <fieldset className="space-y-4">
                <div className="flex items-center justify-between">
                  <legend className="text-lg font-extrabold text-navy">
                    {items.fields.length > 1
                      ? t('booking.step.item', { n: 3 + i, item: i + 1 })
                      : t('booking.step.yourItem', { n: 3 })}
                  </legend>
                  {items.fields.length > 1 && (
                    <Button type="button" variant="quiet" onClick={() => items.remove(i)}>
                      {t('booking.remove')}
                    </Button>
                  )}
                </div>
                <SelectField
                  label={t('booking.what')}
                  error={itemErrors?.categoryId?.message}
                  {...form.register(`items.${i}.categoryId`, {
                    onChange: (e) => {
                      const c = byId.get(Number(e.target.value));
                      if (c) form.setValue(`items.${i}.mains`, c.mains);
                    },
                  })}
                >
                  <option value="">{t('booking.choose')}</option>
                  {SKILLS.map((skill) => {
                    const list = categories.filter((c) => c.skill === skill);
                    return list.length ? (
                      <optgroup key={skill} label={t(`common.skill.${skill}`)}>
                        {list.map((c) => (
                          <option key={c.id} value={c.id}>
                            {excluded.has(c.id) ? t('booking.categoryNotTaken', { name: c.name }) : c.name}
                          </option>
                        ))}
                      </optgroup>
                    ) : null;
                  })}
                </SelectField>
                {screened && !screened.ok && !itemErrors?.categoryId && (
                  <Alert tone="error" title={t('booking.refusedTitle')}>
                    {refusalWords(screened)}
                  </Alert>
                )}
                <div className="grid gap-4 sm:grid-cols-3">
                  <TextField
                    label={t('booking.brand')}
                    error={itemErrors?.brand?.message}
                    {...form.register(`items.${i}.brand`)}
                  />
                  <TextField
                    label={t('booking.model')}
                    error={itemErrors?.model?.message}
                    {...form.register(`items.${i}.model`)}
                  />
                  <TextField
                    label={t('booking.age')}
                    type="number"
                    min={0}
                    inputMode="numeric"
                    error={itemErrors?.ageYears?.message}
                    {...form.register(`items.${i}.ageYears`)}
                  />
                </div>
                <div className="space-y-1">
                  <label htmlFor={`fault-${field.id}`} className="block font-semibold">
                    {t('booking.fault')}
                  </label>
                  <textarea
                    id={`fault-${field.id}`}
                    rows={3}
                    aria-invalid={Boolean(itemErrors?.fault)}
                    className={`block w-full rounded-lg border bg-white px-3 py-2.5 ${itemErrors?.fault ? 'border-alert' : 'border-ink/20'}`}
                    placeholder={t('booking.faultPlaceholder')}
                    {...form.register(`items.${i}.fault`)}
                  />
                  {itemErrors?.fault?.message && (
                    <p className="text-sm font-semibold text-alert">{tr(itemErrors.fault.message)}</p>
                  )}
                </div>
                <div className="flex flex-wrap gap-x-6 gap-y-2">
                  <label className="flex items-center gap-2">
                    <input type="checkbox" className="size-5 accent-copper" {...form.register(`items.${i}.mains`)} />
                    {t('booking.mains')}
                  </label>
                  <label className="flex items-center gap-2">
                    <input type="checkbox" className="size-5 accent-copper" {...form.register(`items.${i}.battery`)} />
                    {t('booking.battery')}
                  </label>
                </div>
                <CheckGroup
                  legend={t('booking.hazardsLegend')}
                  options={hazardQuestions}
                  field={form.register(`items.${i}.hazards`)}
                />
                {(hazards as string[]).length > 0 && (
                  <Alert tone="error" title={t('booking.hazardTitle')}>
                    {(hazards as (typeof HAZARDS)[number][])
                      .map((hazard) => refusalWords({ ok: false, code: 'hazard', hazard }))
                      .join(' ')}
                  </Alert>
                )}
                {itemErrors?.hazards?.message && (
                  <p className="text-sm font-semibold text-alert">{tr(itemErrors.hazards.message)}</p>
                )}
                <div className="space-y-1">
                  <label htmlFor={`photos-${field.id}`} className="block font-semibold">
                    {t('booking.photos', { max: PHOTO_LIMITS.perItem })}
                  </label>
                  <input
                    id={`photos-${field.id}`}
                    type="file"
                    accept="image/jpeg,image/png,image/webp"
                    multiple
                    capture="environment"
                    onChange={(e) => pickPhotos(field.id, e.target.files)}
                    className="block w-full text-sm file:mr-3 file:rounded-lg file:border-0 file:bg-navy file:px-3 file:py-2 file:font-bold file:text-white"
                  />
                  <p className="text-sm text-ink-soft">{t('booking.photosHint')}</p>
                  {photoErrors[field.id] && <p className="text-sm font-semibold text-alert">{photoErrors[field.id]}</p>}
                  {(photos[field.id]?.length ?? 0) > 0 && (
                    <div className="flex gap-2">
                      {photos[field.id].map((f) => (
                        <img
                          key={f.name + f.size}
                          src={URL.createObjectURL(f)}
                          alt={f.name}
                          className="size-20 rounded-lg object-cover ring-1 ring-ink/10"
                        />
                      ))}
                    </div>
                  )}
                </div>
              </fieldset>
            </Card>
          );
        })}
        {items.fields.length < MAX_ITEMS_PER_BOOKING && (
          <Button type="button" variant="secondary" onClick={() => items.append(emptyItem)}>
            {t('booking.addItem')}
          </Button>
        )}
        {errors.items?.message && <p className="text-sm font-semibold text-alert">{tr(errors.items.message)}</p>}

        <HouseRules
          step={3 + items.fields.length}
          houseRules={event.houseRules}
          groupName={event.groupName}
          privacyPath={paths.groupPrivacy(event.groupId)}
          consent={form.register('consent')}
          error={errors.consent?.message}
        />

        <Button type="submit" busy={form.formState.isSubmitting} className="w-full py-3 text-lg">
          {joinsWaitlist ? t('booking.submitWaitlist') : t('booking.submit')}
        </Button>
        {progress && (
          <p role="status" className="text-center text-sm text-ink-soft">
            {progress}
          </p>
        )}
      </form>
    </div>
  );
}
