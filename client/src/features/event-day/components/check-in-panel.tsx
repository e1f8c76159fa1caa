import { useEffect, useRef, useState } from 'react';
import {
  ARRIVALS,
  canMoveTo,
  hasArrived,
  isAbsent,
  isQueued,
  type Arrival,
} from '../../../../../shared/event-day/constants';
import { formatTimeRange } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { SelectField, TextField } from '../../../components/ui/field';
import { ApiError } from '../../../lib/api';
import { useCheckIn } from '../api/check-in';
import type { DeskBooking, DeskView, IssuedItem } from '../api/types';
import { StatusChip } from './status-chip';
import { CategoryOptions, Refusal, screenAtDesk, type DeskScreening } from './desk-screening';
import { IssuedTags } from './issued-tags';
import { tr, useLanguage, useT } from '../../../lib/i18n';

interface Row {
  arrival: Arrival;
  categoryId: number;
  weight: string;
}

/** Check-in item by item: arrived, did not come or withdrawn; category confirmed or corrected; weight if weighed. */
export function CheckInPanel({
  desk,
  booking,
  screening,
  onClose,
}: {
  desk: DeskView;
  booking: DeskBooking;
  screening: DeskScreening;
  onClose: () => void;
}) {
  const t = useT();
  const lang = useLanguage();
  const checkIn = useCheckIn(desk.event.id);
  const [rows, setRows] = useState<Record<number, Row>>(() =>
    Object.fromEntries(
      booking.items.map((i) => [
        i.id,
        {
          arrival: isAbsent(i.status) ? (i.status as Arrival) : 'arrived',
          categoryId: i.categoryId,
          weight: i.weighedKg?.toString() ?? '',
        },
      ]),
    ),
  );
  const [issued, setIssued] = useState<IssuedItem[] | null>(null);
  const slot = desk.slots.find((s) => s.id === booking.slotId);
  const error = checkIn.error instanceof ApiError ? checkIn.error : null;
  // A kind corrected at the desk goes through the booking's screening: the group's exclusions still hold.
  const screened = (i: DeskBooking['items'][number]) =>
    rows[i.id].arrival === 'arrived' && rows[i.id].categoryId !== i.categoryId
      ? screenAtDesk(screening, rows[i.id].categoryId, [])
      : ({ ok: true } as const);
  const refused = booking.items.some((i) => !screened(i).ok);
  const fieldError = (path: string) => (error?.fields?.[path] ? tr(error.fields[path]) : undefined);

  const heading = useRef<HTMLHeadingElement>(null);
  useEffect(() => heading.current?.focus(), []);
  if (issued) return <IssuedTags eventId={desk.event.id} issued={issued} onClose={onClose} />;
  return (
    <Card className="ring-2 ring-copper">
      <form
        onKeyDown={(e) => {
          if (e.key === 'Escape') onClose();
        }}
        onSubmit={(e) => {
          e.preventDefault();
          if (refused) return;
          checkIn.mutate(
            {
              reference: booking.reference,
              body: {
                items: booking.items.map((i) => ({
                  id: i.id,
                  arrival: rows[i.id].arrival,
                  categoryId: rows[i.id].categoryId,
                  weightKg: rows[i.id].weight.replace(',', '.') || undefined,
                })),
              },
            },
            { onSuccess: (r) => setIssued(r.items) },
          );
        }}
        className="space-y-4"
        aria-label={t('desk.checkIn.form', { reference: booking.reference })}
      >
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 ref={heading} tabIndex={-1} className="text-xl outline-none">
            <span className="font-mono">{booking.reference}</span> · {booking.visitorName}
          </h2>
          <p className="text-ink-soft">
            {slot && formatTimeRange(slot.startsAt, slot.endsAt, desk.event.timeZone, lang)}
            {booking.visitorPhone && ` · ${booking.visitorPhone}`}
          </p>
        </div>
        {error && (
          <Alert tone="error">
            {tr(error.message)}
            {error.fields &&
              Object.keys(error.fields).some((k) => !/^items\.\d+\.(weightKg|categoryId|arrival)$/.test(k)) && (
                <>
                  {' '}
                  {Object.values(error.fields)
                    .map((m) => tr(m))
                    .join(' ')}
                </>
              )}
          </Alert>
        )}
        {booking.items.map((i, n) => {
          const row = rows[i.id];
          const set = (patch: Partial<Row>) => setRows((r) => ({ ...r, [i.id]: { ...r[i.id], ...patch } }));
          // At a bench or done: the desk no longer changes its arrival.
          const locked = hasArrived(i.status) && !isQueued(i.status);
          return (
            <fieldset key={i.id} className="space-y-3 rounded-lg border border-ink/10 p-3">
              <legend className="px-1 font-bold">
                {t('desk.itemN', { n: n + 1 })}: {i.categoryName}
                {i.brand && ` — ${[i.brand, i.model].filter(Boolean).join(' ')}`} <StatusChip status={i.status} />
                {i.tagCode && <span className="ml-2 font-mono text-navy">{i.tagCode}</span>}
              </legend>
              <p className="text-sm text-ink-soft">“{i.fault}”</p>
              {locked ? (
                <p className="text-sm">
                  {i.status === 'done' ? t('desk.checkIn.alreadyDone') : t('desk.checkIn.alreadyAtBench')}
                </p>
              ) : (
                <>
                  <div
                    role="radiogroup"
                    aria-label={t('desk.checkIn.arrival', { n: n + 1 })}
                    className="flex flex-wrap gap-2"
                  >
                    {ARRIVALS.filter(
                      (a) => a !== 'no-show' || i.status === 'no-show' || canMoveTo(i.status, 'no-show'),
                    ).map((a) => (
                      <label
                        key={a}
                        className={`flex min-h-11 cursor-pointer items-center gap-2 rounded-lg px-3 ring-1 has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-copper has-[:focus-visible]:ring-offset-2 ${row.arrival === a ? 'bg-navy text-white ring-navy' : 'bg-white ring-ink/20'}`}
                      >
                        <input
                          type="radio"
                          name={`arrival-${i.id}`}
                          value={a}
                          checked={row.arrival === a}
                          onChange={() => set({ arrival: a })}
                          className="sr-only"
                        />
                        {a === 'arrived'
                          ? i.tagCode
                            ? t('desk.checkIn.here')
                            : t('desk.checkIn.arrived')
                          : t(`fixer.status.${a}`)}
                      </label>
                    ))}
                  </div>
                  {error?.fields?.[`items.${n}.arrival`] && (
                    <p className="text-sm font-semibold text-alert">{tr(error.fields[`items.${n}.arrival`])}</p>
                  )}
                  {row.arrival === 'arrived' && (
                    <div className="grid gap-3 sm:grid-cols-2">
                      <SelectField
                        label={t('desk.kind')}
                        value={row.categoryId}
                        onChange={(e) => set({ categoryId: Number(e.target.value) })}
                        error={fieldError(`items.${n}.categoryId`)}
                        hint={t('desk.checkIn.kindHint')}
                      >
                        <CategoryOptions screening={screening} />
                      </SelectField>
                      <TextField
                        label={t('desk.weight')}
                        inputMode="decimal"
                        value={row.weight}
                        onChange={(e) => set({ weight: e.target.value })}
                        placeholder={t('desk.checkIn.weightPlaceholder')}
                        error={fieldError(`items.${n}.weightKg`)}
                        hint={t('desk.checkIn.weightHint')}
                      />
                    </div>
                  )}
                  <Refusal result={screened(i)} />
                </>
              )}
            </fieldset>
          );
        })}
        <div className="flex flex-wrap gap-2">
          <Button type="submit" busy={checkIn.isPending} disabled={refused}>
            {booking.items.some((i) => i.tagCode) ? t('desk.checkIn.save') : t('desk.checkIn.submit')}
          </Button>
          <Button type="button" variant="secondary" onClick={onClose}>
            {t('desk.cancel')}
          </Button>
        </div>
      </form>
    </Card>
  );
}
