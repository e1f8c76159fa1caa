import { useMemo, useRef, useState } from 'react';
import { useFieldArray } from 'react-hook-form';
import { useNavigate, useSearchParams } from 'react-router';
import { HAZARDS, SKILL_LABELS } from '../../../../../shared/constants';
import { formatDay } from '../../../../../shared/format';
import { slotBookability } from '../../../../../shared/booking/bookability';
import { HAZARD_REFUSALS } from '../../../../../shared/booking/screening';
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
import { WaitlistJoined } from './waitlist-joined';
import { HouseRules } from './house-rules';
import { TimeTiles } from './time-tiles';
import { useCreateBooking } from '../api/create-booking';
import { useJoinWaitlist } from '../api/join-waitlist';
import { uploadPhotos } from '../api/upload-photos';

const HAZARD_QUESTIONS = HAZARDS.map((h) => ({ value: h, label: HAZARD_REFUSALS[h].question }));

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
        ? `“${bad.name}” is ${bad.size > PHOTO_LIMITS.maxBytes ? 'larger than 8 MB' : 'not a JPEG, PNG or WebP photo'}.`
        : (list?.length ?? 0) > PHOTO_LIMITS.perItem
          ? `Only the first ${PHOTO_LIMITS.perItem} photos are kept.`
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
      setProgress('Booking your place…');
      const created = await book.mutateAsync(values);
      const failed: string[] = [];
      for (const [i, field] of items.fields.entries()) {
        const files = photos[field.id] ?? [];
        if (!files.length) continue;
        setProgress(`Uploading photos of item ${i + 1}…`);
        try {
          await uploadPhotos(created.reference, created.manageToken, created.itemIds[i], files);
        } catch (err) {
          failed.push(err instanceof ApiError ? err.message : 'A photo could not be uploaded.');
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
        title="Book a repair slot"
        lead={`${event.title} · ${formatDay(event.startsAt, tz)} · ${event.venue.name}, ${event.venue.town}`}
      />
      <form onSubmit={onSubmit} noValidate className="space-y-6">
        {formError && (
          <div ref={errorRef} tabIndex={-1}>
            <Alert tone="error">{formError}</Alert>
          </div>
        )}

        <Card>
          <fieldset>
            <legend className="text-lg font-extrabold text-navy">1. Choose a time</legend>
            <TimeTiles
              slots={event.slots}
              timeZone={tz}
              now={now}
              chosenId={slotId}
              bookability={bookability}
              field={form.register('slotId')}
            />
            {errors.slotId && <p className="mt-2 text-sm font-semibold text-alert">{errors.slotId.message}</p>}
            {chosenRefused && (
              <div className="mt-3">
                <Alert tone="error">{chosenRefused.message}</Alert>
              </div>
            )}
            {joinsWaitlist && (
              <div className="mt-3">
                <Alert tone="caution">
                  This time has no room for {watchedItems.length > 1 ? 'all your items' : 'your item'}. Send the form to
                  join its waiting list, or choose another time.
                </Alert>
              </div>
            )}
          </fieldset>
        </Card>

        <Card>
          <fieldset className="space-y-4">
            <legend className="text-lg font-extrabold text-navy">2. About you</legend>
            <TextField
              label="Your name"
              autoComplete="name"
              error={errors.visitor?.name?.message}
              {...form.register('visitor.name')}
            />
            <TextField
              label="E-mail"
              type="email"
              autoComplete="email"
              inputMode="email"
              hint="We send the confirmation and your booking link here."
              error={errors.visitor?.email?.message}
              {...form.register('visitor.email')}
            />
            <TextField
              label="Phone (optional)"
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
          const refused = cat && excluded.has(cat.id);
          const hazards = watchedItems[i]?.hazards ?? [];
          const itemErrors = errors.items?.[i];
          return (
            <Card key={field.id}>
              <fieldset className="space-y-4">
                <div className="flex items-center justify-between">
                  <legend className="text-lg font-extrabold text-navy">
                    {3 + i}. {items.fields.length > 1 ? `Item ${i + 1}` : 'Your item'}
                  </legend>
                  {items.fields.length > 1 && (
                    <Button type="button" variant="quiet" onClick={() => items.remove(i)}>
                      Remove
                    </Button>
                  )}
                </div>
                <SelectField
                  label="What is it?"
                  error={itemErrors?.categoryId?.message}
                  {...form.register(`items.${i}.categoryId`, {
                    onChange: (e) => {
                      const c = byId.get(Number(e.target.value));
                      if (c) form.setValue(`items.${i}.mains`, c.mains);
                    },
                  })}
                >
                  <option value="">Choose…</option>
                  {Object.entries(SKILL_LABELS).map(([skill, label]) => {
                    const list = categories.filter((c) => c.skill === skill);
                    return list.length ? (
                      <optgroup key={skill} label={label}>
                        {list.map((c) => (
                          <option key={c.id} value={c.id}>
                            {c.name}
                            {excluded.has(c.id) ? ' (not taken)' : ''}
                          </option>
                        ))}
                      </optgroup>
                    ) : null;
                  })}
                </SelectField>
                {refused && !itemErrors?.categoryId && (
                  <Alert tone="error" title="This group does not take it">
                    {cat.refusal
                      ? `${cat.refusal.reason} ${cat.refusal.suggestion}`
                      : `${event.groupName} does not take this kind of item. Look for another group’s session.`}
                  </Alert>
                )}
                <div className="grid gap-4 sm:grid-cols-3">
                  <TextField
                    label="Brand (optional)"
                    error={itemErrors?.brand?.message}
                    {...form.register(`items.${i}.brand`)}
                  />
                  <TextField
                    label="Model (optional)"
                    error={itemErrors?.model?.message}
                    {...form.register(`items.${i}.model`)}
                  />
                  <TextField
                    label="Age in years (optional)"
                    type="number"
                    min={0}
                    inputMode="numeric"
                    error={itemErrors?.ageYears?.message}
                    {...form.register(`items.${i}.ageYears`)}
                  />
                </div>
                <div className="space-y-1">
                  <label htmlFor={`fault-${field.id}`} className="block font-semibold">
                    What is wrong with it?
                  </label>
                  <textarea
                    id={`fault-${field.id}`}
                    rows={3}
                    aria-invalid={Boolean(itemErrors?.fault)}
                    className={`block w-full rounded-lg border bg-white px-3 py-2.5 ${itemErrors?.fault ? 'border-alert' : 'border-ink/20'}`}
                    placeholder="In your own words: what happens, since when, anything you tried."
                    {...form.register(`items.${i}.fault`)}
                  />
                  {itemErrors?.fault && <p className="text-sm font-semibold text-alert">{itemErrors.fault.message}</p>}
                </div>
                <div className="flex flex-wrap gap-x-6 gap-y-2">
                  <label className="flex items-center gap-2">
                    <input type="checkbox" className="size-5 accent-copper" {...form.register(`items.${i}.mains`)} />
                    Plugs into the mains
                  </label>
                  <label className="flex items-center gap-2">
                    <input type="checkbox" className="size-5 accent-copper" {...form.register(`items.${i}.battery`)} />
                    Has a battery
                  </label>
                </div>
                <CheckGroup
                  legend="Safety questions: tick any that apply"
                  options={HAZARD_QUESTIONS}
                  field={form.register(`items.${i}.hazards`)}
                />
                {(hazards as string[]).length > 0 && (
                  <Alert tone="error" title="Please do not bring it">
                    {(hazards as (typeof HAZARDS)[number][])
                      .map((h) => `${HAZARD_REFUSALS[h].reason} ${HAZARD_REFUSALS[h].suggestion}`)
                      .join(' ')}
                  </Alert>
                )}
                {itemErrors?.hazards && (
                  <p className="text-sm font-semibold text-alert">{itemErrors.hazards.message}</p>
                )}
                <div className="space-y-1">
                  <label htmlFor={`photos-${field.id}`} className="block font-semibold">
                    Photos (optional, up to 3)
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
                  <p className="text-sm text-ink-soft">
                    The label with the model number, and the fault if it shows. At most 8 MB each.
                  </p>
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
            + Add another item
          </Button>
        )}
        {errors.items?.message && <p className="text-sm font-semibold text-alert">{errors.items.message}</p>}

        <HouseRules
          step={3 + items.fields.length}
          houseRules={event.houseRules}
          groupName={event.groupName}
          privacyPath={paths.groupPrivacy(event.groupId)}
          consent={form.register('consent')}
          error={errors.consent?.message}
        />

        <Button type="submit" busy={form.formState.isSubmitting} className="w-full py-3 text-lg">
          {joinsWaitlist ? 'Join the waiting list' : 'Book my slot'}
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
