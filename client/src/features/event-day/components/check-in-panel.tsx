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
        aria-label={`Check in ${booking.reference}`}
      >
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 ref={heading} tabIndex={-1} className="text-xl outline-none">
            <span className="font-mono">{booking.reference}</span> · {booking.visitorName}
          </h2>
          <p className="text-ink-soft">
            {slot && formatTimeRange(slot.startsAt, slot.endsAt, desk.event.timeZone)}
            {booking.visitorPhone && ` · ${booking.visitorPhone}`}
          </p>
        </div>
        {error && (
          <Alert tone="error">
            {error.message}
            {error.fields &&
              Object.keys(error.fields).some((k) => !/^items\.\d+\.(weightKg|categoryId|arrival)$/.test(k)) && (
                <> {Object.values(error.fields).join(' ')}</>
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
                Item {n + 1}: {i.categoryName}
                {i.brand && ` — ${[i.brand, i.model].filter(Boolean).join(' ')}`} <StatusChip status={i.status} />
                {i.tagCode && <span className="ml-2 font-mono text-navy">{i.tagCode}</span>}
              </legend>
              <p className="text-sm text-ink-soft">“{i.fault}”</p>
              {locked ? (
                <p className="text-sm">This item is already {i.status === 'done' ? 'done' : 'at a bench'}.</p>
              ) : (
                <>
                  <div role="radiogroup" aria-label={`Item ${n + 1} arrival`} className="flex flex-wrap gap-2">
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
                            ? 'Here'
                            : 'Arrived'
                          : a === 'no-show'
                            ? 'Did not come'
                            : 'Withdrawn'}
                      </label>
                    ))}
                  </div>
                  {error?.fields?.[`items.${n}.arrival`] && (
                    <p className="text-sm font-semibold text-alert">{error.fields[`items.${n}.arrival`]}</p>
                  )}
                  {row.arrival === 'arrived' && (
                    <div className="grid gap-3 sm:grid-cols-2">
                      <SelectField
                        label="Kind of item"
                        value={row.categoryId}
                        onChange={(e) => set({ categoryId: Number(e.target.value) })}
                        error={error?.fields?.[`items.${n}.categoryId`]}
                        hint="Correct it if the visitor chose the wrong kind."
                      >
                        <CategoryOptions screening={screening} />
                      </SelectField>
                      <TextField
                        label="Weight in kg (if weighed)"
                        inputMode="decimal"
                        value={row.weight}
                        onChange={(e) => set({ weight: e.target.value })}
                        placeholder="e.g. 1.2"
                        error={error?.fields?.[`items.${n}.weightKg`]}
                        hint="Overrides the kind’s average weight in the statistics."
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
            {booking.items.some((i) => i.tagCode) ? 'Save changes' : 'Check in'}
          </Button>
          <Button type="button" variant="secondary" onClick={onClose}>
            Cancel
          </Button>
        </div>
      </form>
    </Card>
  );
}
