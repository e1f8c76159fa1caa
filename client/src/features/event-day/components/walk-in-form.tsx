import { useState } from 'react';
import { useFieldArray } from 'react-hook-form';
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
import { useLanguage, useT } from '../../../lib/i18n';

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
  const t = useT();
  const lang = useLanguage();
  const hazardQuestions = HAZARDS.map((h) => ({ value: h, label: t(`booking.hazard.${h}.question`) }));
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
        aria-label={t('desk.walkIn.form')}
        className="space-y-4"
        onSubmit={form.handleSubmit((values) => {
          setFormError(null);
          if (refused) return setFormError(t('desk.walkIn.refused'));
          walkIn.mutate(values, {
            onSuccess: (r) => setIssued(r.items),
            onError: (e) => setFormError(applyServerErrors(form, e)),
          });
        })}
      >
        <h2 className="text-xl">{t('desk.walkIn.title')}</h2>
        {formError && <Alert tone="error">{formError}</Alert>}
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField
            label={t('desk.walkIn.name')}
            {...form.register('visitor.name')}
            error={errs.visitor?.name?.message}
            autoFocus
          />
          <TextField
            label={t('desk.walkIn.phone')}
            type="tel"
            {...form.register('visitor.phone')}
            error={errs.visitor?.phone?.message}
          />
          <TextField
            label={t('desk.walkIn.email')}
            type="email"
            {...form.register('visitor.email')}
            error={errs.visitor?.email?.message}
            hint={t('desk.walkIn.emailHint')}
          />
        </div>
        <SelectField label={t('desk.walkIn.slot')} {...form.register('slotId')} hint={t('desk.walkIn.slotHint')}>
          {desk.slots.map((s) => (
            <option key={s.id} value={s.id}>
              {s.id === desk.currentSlotId
                ? t('desk.walkIn.slotNow', { time: formatTime(s.startsAt, desk.event.timeZone, lang) })
                : formatTime(s.startsAt, desk.event.timeZone, lang)}
            </option>
          ))}
        </SelectField>
        {items.fields.map((f, n) => (
          <fieldset key={f.id} className="space-y-3 rounded-lg border border-ink/10 p-3">
            <legend className="px-1 font-bold">{t('desk.itemN', { n: n + 1 })}</legend>
            <div className="grid gap-3 sm:grid-cols-3">
              <SelectField
                label={t('desk.kind')}
                {...form.register(`items.${n}.categoryId`, {
                  onChange: (e) => {
                    const kind = screening.categories.find((c) => c.id === Number(e.target.value));
                    if (kind) form.setValue(`items.${n}.mains`, kind.mains);
                  },
                })}
                error={errs.items?.[n]?.categoryId?.message}
              >
                <option value="">{t('desk.walkIn.choose')}</option>
                <CategoryOptions screening={screening} />
              </SelectField>
              <TextField label={t('desk.walkIn.brand')} {...form.register(`items.${n}.brand`)} />
              <TextField
                label={t('desk.weight')}
                inputMode="decimal"
                {...form.register(`items.${n}.weightKg`)}
                error={errs.items?.[n]?.weightKg?.message}
              />
            </div>
            <TextAreaField
              label={t('desk.walkIn.fault')}
              rows={2}
              {...form.register(`items.${n}.fault`)}
              error={
                errs.items?.[n]?.fault?.message ??
                (errs.items?.[n] as { hazards?: { message?: string } } | undefined)?.hazards?.message
              }
            />
            <CheckGroup
              legend={t('booking.hazardsLegend')}
              options={hazardQuestions}
              field={form.register(`items.${n}.hazards`)}
            />
            {screened[n] && <Refusal result={screened[n]} />}
            {items.fields.length > 1 && (
              <Button type="button" variant="quiet" onClick={() => items.remove(n)}>
                {t('desk.walkIn.remove')}
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
            {t('desk.walkIn.add')}
          </Button>
        )}
        <div className="space-y-2 rounded-lg bg-navy/5 p-3">
          <CheckField label={t('desk.walkIn.consent')} {...form.register('consent')} error={errs.consent?.message} />
          <TextField
            label={t('desk.walkIn.consentName')}
            {...form.register('consentName')}
            error={errs.consentName?.message}
          />
        </div>
        <div className="flex flex-wrap gap-2">
          <Button type="submit" busy={walkIn.isPending} disabled={refused}>
            {t('desk.walkIn.submit')}
          </Button>
          <Button type="button" variant="secondary" onClick={onDone}>
            {t('desk.cancel')}
          </Button>
        </div>
      </form>
    </Card>
  );
}
