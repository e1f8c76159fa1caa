import { useState } from 'react';
import { useFieldArray } from 'react-hook-form';
import { HAZARD_REFUSALS } from '../../../../../shared/booking/screening';
import { HAZARDS, type Hazard } from '../../../../../shared/constants';
import { formatTime } from '../../../../../shared/format';
import { walkInSchema } from '../../../../../shared/schemas/event-day';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { CheckField, SelectField, TextAreaField, TextField } from '../../../components/ui/field';
import { applyServerErrors, useZodForm } from '../../../lib/form';
import { useAddWalkIn } from '../api/add-walk-in';
import type { DeskView, IssuedItem } from '../api/types';
import { CategoryOptions, Refusal, screenAtDesk, type DeskScreening } from './desk-screening';
import { IssuedTags } from './issued-tags';
import { CheckGroup } from '../../../components/ui/check-group';

const HAZARD_QUESTIONS = HAZARDS.map((h) => ({ value: h, label: HAZARD_REFUSALS[h].question }));

/** A walk-in: the same item questions as booking, fast, with the house rules accepted by a tick and a typed name. */
export function WalkInForm({
  desk,
  screening,
  onDone,
}: {
  desk: DeskView;
  screening: DeskScreening;
  onDone: () => void;
}) {
  const walkIn = useAddWalkIn(desk.event.id);
  const [issued, setIssued] = useState<IssuedItem[] | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const form = useZodForm(walkInSchema, {
    slotId: desk.currentSlotId ?? undefined,
    visitor: { name: '', email: '', phone: '' },
    items: [{ categoryId: undefined as never, fault: '', hazards: [] }],
    consentName: '',
  });
  const items = useFieldArray({ control: form.control, name: 'items' });
  const errs = form.formState.errors;
  // The booking's screening, item by item, as the form is filled in: a refused item is never sent.
  const screened = (form.watch('items') ?? []).map((i) =>
    screenAtDesk(
      screening,
      i?.categoryId as number | undefined,
      (Array.isArray(i?.hazards) ? i.hazards : []) as Hazard[],
    ),
  );
  const refused = screened.some((r) => !r.ok);
  if (issued) return <IssuedTags eventId={desk.event.id} issued={issued} onClose={onDone} />;
  return (
    <Card className="ring-2 ring-copper">
      <form
        noValidate
        aria-label="Walk-in"
        className="space-y-4"
        onSubmit={form.handleSubmit((values) => {
          setFormError(null);
          if (refused) return setFormError('The group cannot take an item on this form: see why below it.');
          walkIn.mutate(values, {
            onSuccess: (r) => setIssued(r.items),
            onError: (e) => setFormError(applyServerErrors(form, e)),
          });
        })}
      >
        <h2 className="text-xl">New walk-in</h2>
        {formError && <Alert tone="error">{formError}</Alert>}
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField
            label="Visitor’s name"
            {...form.register('visitor.name')}
            error={errs.visitor?.name?.message}
            autoFocus
          />
          <TextField
            label="Phone (optional)"
            type="tel"
            {...form.register('visitor.phone')}
            error={errs.visitor?.phone?.message}
          />
          <TextField
            label="E-mail (optional)"
            type="email"
            {...form.register('visitor.email')}
            error={errs.visitor?.email?.message}
            hint="For news of a part or a follow-up."
          />
        </div>
        <SelectField
          label="Queue in the slot"
          {...form.register('slotId')}
          hint="Walk-ins wait after the booked visitors of their slot."
        >
          {desk.slots.map((s) => (
            <option key={s.id} value={s.id}>
              {formatTime(s.startsAt, desk.event.timeZone)}
              {s.id === desk.currentSlotId ? ' (now)' : ''}
            </option>
          ))}
        </SelectField>
        {items.fields.map((f, n) => (
          <fieldset key={f.id} className="space-y-3 rounded-lg border border-ink/10 p-3">
            <legend className="px-1 font-bold">Item {n + 1}</legend>
            <div className="grid gap-3 sm:grid-cols-3">
              <SelectField
                label="Kind of item"
                {...form.register(`items.${n}.categoryId`, {
                  onChange: (e) => {
                    const kind = screening.categories.find((c) => c.id === Number(e.target.value));
                    if (kind) form.setValue(`items.${n}.mains`, kind.mains);
                  },
                })}
                error={errs.items?.[n]?.categoryId?.message}
              >
                <option value="">Choose…</option>
                <CategoryOptions screening={screening} />
              </SelectField>
              <TextField label="Brand (optional)" {...form.register(`items.${n}.brand`)} />
              <TextField
                label="Weight in kg (if weighed)"
                inputMode="decimal"
                {...form.register(`items.${n}.weightKg`)}
                error={errs.items?.[n]?.weightKg?.message}
              />
            </div>
            <TextAreaField
              label="What is wrong?"
              rows={2}
              {...form.register(`items.${n}.fault`)}
              error={
                errs.items?.[n]?.fault?.message ??
                (errs.items?.[n] as { hazards?: { message?: string } } | undefined)?.hazards?.message
              }
            />
            <CheckGroup
              legend="Safety questions: tick any that apply"
              options={HAZARD_QUESTIONS}
              field={form.register(`items.${n}.hazards`)}
            />
            {screened[n] && <Refusal result={screened[n]} />}
            {items.fields.length > 1 && (
              <Button type="button" variant="quiet" onClick={() => items.remove(n)}>
                Remove this item
              </Button>
            )}
          </fieldset>
        ))}
        {items.fields.length < 3 && (
          <Button
            type="button"
            variant="secondary"
            onClick={() => items.append({ categoryId: undefined as never, fault: '', hazards: [] })}
          >
            Add another item
          </Button>
        )}
        <div className="space-y-2 rounded-lg bg-navy/5 p-3">
          <CheckField
            label="The visitor has read and accepts the house rules"
            {...form.register('consent')}
            error={errs.consent?.message}
          />
          <TextField
            label="Name typed by the person accepting"
            {...form.register('consentName')}
            error={errs.consentName?.message}
          />
        </div>
        <div className="flex flex-wrap gap-2">
          <Button type="submit" busy={walkIn.isPending} disabled={refused}>
            Check in walk-in
          </Button>
          <Button type="button" variant="secondary" onClick={onDone}>
            Cancel
          </Button>
        </div>
      </form>
    </Card>
  );
}
