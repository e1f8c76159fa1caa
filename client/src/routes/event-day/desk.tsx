import { useEffect, useMemo, useRef, useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import { useFieldArray } from 'react-hook-form';
import { type Arrival, type ItemStatus } from '../../../../shared/event-day/constants';
import { readScan } from '../../../../shared/event-day/tag-code';
import { formatDay, formatTime, formatTimeRange } from '../../../../shared/format';
import { walkInSchema } from '../../../../shared/schemas/event-day';
import { Button } from '../../components/ui/button';
import { Alert, Card, EmptyState, PageTitle, Spinner } from '../../components/ui/feedback';
import { CheckField, SelectField, TextAreaField, TextField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { useCategoriesQuery } from '../../features/categories/api/get-categories';
import type { Category } from '../../../../shared/api/categories';
import { useCheckIn } from '../../features/event-day/api/check-in';
import { useAddWalkIn } from '../../features/event-day/api/add-walk-in';
import { useDesk } from '../../features/event-day/api/get-desk';
import { useDeskEvents } from '../../features/event-day/api/get-desk-events';
import type { DeskView, DeskBooking, IssuedItem } from '../../features/event-day/api/types';
import { QrScan } from '../../features/event-day/qr-scan';
import { StatusChip } from '../../features/event-day/status-chip';
import { ApiError } from '../../lib/api';
import { applyServerErrors, useZodForm } from '../../lib/form';

/** /desk: the sessions reception can open, today's first. */
export function DeskHomePage() {
  const { data, isPending, error } = useDeskEvents();
  if (isPending) return <Spinner />;
  if (error) return <Alert tone="error">{error.message}</Alert>;
  const open = data.filter((e) => e.open);
  const later = data.filter((e) => !e.open);
  return (
    <div className="space-y-6">
      <PageTitle title="Reception desk" lead="Check visitors in, take walk-ins and print the intake tags." />
      {open.length === 0 && (
        <EmptyState title="No session is open for check-in" icon="☑">
          Check-in opens on the day of a session.{' '}
          {later[0] && (
            <>
              The next one is {later[0].title} on {formatDay(later[0].startsAt, later[0].timeZone)}.
            </>
          )}
        </EmptyState>
      )}
      <div className="grid gap-4 md:grid-cols-2">
        {open.map((e) => (
          <Card key={e.id}>
            <p className="text-sm text-ink-soft">{e.groupName}</p>
            <h2 className="text-xl">{e.title}</h2>
            <p className="mb-4">
              {formatDay(e.startsAt, e.timeZone)}, {formatTimeRange(e.startsAt, e.endsAt, e.timeZone)}
            </p>
            <Link
              to={paths.deskEvent(e.id)}
              className="inline-flex min-h-11 items-center rounded-lg bg-copper px-4 font-bold text-white hover:bg-copper-dark"
            >
              Open the desk
            </Link>
          </Card>
        ))}
      </div>
      {later.length > 0 && (
        <section>
          <h2 className="mb-2 text-lg">Coming up</h2>
          <ul className="divide-y divide-ink/10 rounded-xl bg-white ring-1 ring-ink/5">
            {later.map((e) => (
              <li key={e.id} className="px-4 py-3">
                {e.title} — {formatDay(e.startsAt, e.timeZone)}{' '}
                <span className="text-sm text-ink-soft">({e.groupName}; check-in opens on the day)</span>
              </li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}

/** /desk/:eventId: today's bookings by slot, search, scan, check-in item by item, walk-ins. */
export function DeskPage() {
  const eventId = Number(useParams().eventId);
  const navigate = useNavigate();
  const { data: desk, isPending, error } = useDesk(eventId);
  const [search, setSearch] = useState('');
  const [selected, setSelected] = useState<string | null>(null);
  const [scanning, setScanning] = useState(false);
  const [walkIn, setWalkIn] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const searchRef = useRef<HTMLInputElement>(null);

  const all = useMemo(() => desk?.slots.flatMap((s) => s.bookings) ?? [], [desk]);
  if (isPending) return <Spinner label="Loading today’s bookings…" />;
  if (error) return <Alert tone="error">{error.message}</Alert>;

  const find = (text: string) => {
    const scan = readScan(text);
    if (scan?.kind === 'tag') {
      const item = all.flatMap((b) => b.items).find((i) => i.tagCode === scan.code);
      if (item) return navigate(paths.item(item.id));
    }
    if (scan?.kind === 'booking') {
      const b = all.find((x) => x.reference === scan.reference);
      if (b) {
        setSelected(b.reference);
        setNotice(null);
        return;
      }
      setNotice(
        `No booking ${scan.reference} for this session. Check the date on the visitor’s mail, or take them as a walk-in.`,
      );
      return;
    }
    const q = text.trim().toLowerCase();
    const named = q ? all.filter((b) => b.visitorName.toLowerCase().includes(q)) : [];
    if (named.length === 1) {
      setSelected(named[0].reference);
      setNotice(null);
      return;
    }
    setNotice(
      q && named.length === 0
        ? `No booking matches “${text.trim()}”. Take them as a walk-in if they have no booking.`
        : null,
    );
  };

  const q = search.trim().toLowerCase();
  const matches = (b: DeskBooking) =>
    !q ||
    b.visitorName.toLowerCase().includes(q) ||
    b.reference.toLowerCase().replace('-', '').includes(q.replace('-', ''));
  const counts = all
    .flatMap((b) => b.items)
    .reduce((m, i) => ({ ...m, [i.status]: (m[i.status] ?? 0) + 1 }), {} as Partial<Record<ItemStatus, number>>);
  const current = selected ? all.find((b) => b.reference === selected) : undefined;
  const { event } = desk;

  return (
    <div className="space-y-5">
      <PageTitle
        title="Reception desk"
        lead={
          <>
            {event.title} · {formatDay(event.startsAt, event.timeZone)},{' '}
            {formatTimeRange(event.startsAt, event.endsAt, event.timeZone)}
          </>
        }
      />
      {!desk.open && (
        <Alert tone="caution" title="Check-in is not open">
          Check-in opens on the day of the session.
        </Alert>
      )}
      <div className="flex flex-wrap gap-2 text-sm" aria-label="Items today">
        <span className="rounded-lg bg-white px-3 py-1.5 ring-1 ring-ink/10">
          <b>{counts.booked ?? 0}</b> still to come
        </span>
        <span className="rounded-lg bg-white px-3 py-1.5 ring-1 ring-ink/10">
          <b>{(counts['checked-in'] ?? 0) + (counts.waiting ?? 0)}</b> waiting
        </span>
        <span className="rounded-lg bg-white px-3 py-1.5 ring-1 ring-ink/10">
          <b>{counts['at-bench'] ?? 0}</b> at a bench
        </span>
        <span className="rounded-lg bg-white px-3 py-1.5 ring-1 ring-ink/10">
          <b>{counts.done ?? 0}</b> done
        </span>
        <span className="rounded-lg bg-white px-3 py-1.5 ring-1 ring-ink/10">
          <b>{counts['no-show'] ?? 0}</b> did not come
        </span>
        <Link className="ml-auto font-semibold text-navy underline" to={paths.tags(eventId)} target="_blank">
          Print all tags
        </Link>
        <Link className="font-semibold text-navy underline" to={paths.hall(eventId)} target="_blank">
          Hall display
        </Link>
      </div>

      <Card>
        <form
          className="flex flex-wrap items-end gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            find(search);
          }}
        >
          <div className="w-full min-w-60 flex-1 sm:w-auto">
            <TextField
              ref={searchRef}
              label="Reference or name"
              value={search}
              onChange={(e) => setSearch(e.target.value)}
              placeholder="K7M-2QD or Orla"
              autoComplete="off"
              autoFocus
              hint="Type the reference from the visitor’s mail and press Enter, or part of their name to filter the list."
            />
          </div>
          <div className="flex w-full flex-wrap gap-2 sm:w-auto sm:pb-7">
            <Button type="submit" variant="secondary">
              Find
            </Button>
            <Button type="button" variant="secondary" onClick={() => setScanning((s) => !s)}>
              {scanning ? 'Close camera' : 'Scan QR code'}
            </Button>
            <Button
              type="button"
              onClick={() => {
                setWalkIn(true);
                setSelected(null);
              }}
            >
              New walk-in
            </Button>
          </div>
        </form>
        {notice && (
          <div className="mt-3">
            <Alert tone="caution">{notice}</Alert>
          </div>
        )}
        {scanning && (
          <div className="mt-3">
            <QrScan
              onClose={() => setScanning(false)}
              onResult={(text) => {
                setScanning(false);
                setSearch('');
                find(text);
              }}
            />
          </div>
        )}
      </Card>

      {walkIn && (
        <WalkInForm
          desk={desk}
          onDone={() => {
            setWalkIn(false);
            setSearch('');
            searchRef.current?.focus();
          }}
        />
      )}
      {current && (
        <CheckInPanel
          key={current.reference}
          desk={desk}
          booking={current}
          onClose={() => {
            setSelected(null);
            setSearch('');
            searchRef.current?.focus();
          }}
        />
      )}

      {desk.slots.map((s) => {
        const list = s.bookings.filter(matches);
        if (q && list.length === 0) return null;
        return (
          <section key={s.id} aria-label={`Slot ${formatTimeRange(s.startsAt, s.endsAt, event.timeZone)}`}>
            <div className="mb-2 flex items-baseline gap-3">
              <h2 className="text-lg">{formatTimeRange(s.startsAt, s.endsAt, event.timeZone)}</h2>
              {s.id === desk.currentSlotId && (
                <span className="rounded-full bg-copper px-2 py-0.5 text-xs font-bold text-white">now</span>
              )}
              {s.bookings.some((b) => b.items.some((i) => i.tagCode)) && (
                <Link
                  className="text-sm font-semibold text-navy underline"
                  to={paths.tags(eventId, { slotId: s.id })}
                  target="_blank"
                >
                  Print this slot’s tags
                </Link>
              )}
            </div>
            {list.length === 0 ? (
              <p className="rounded-lg border border-dashed border-ink/15 px-4 py-3 text-sm text-ink-soft">
                No bookings for this time.
              </p>
            ) : (
              <ul className="divide-y divide-ink/10 overflow-hidden rounded-xl bg-white ring-1 ring-ink/5">
                {list.map((b) => (
                  <li key={b.id}>
                    <button
                      type="button"
                      onClick={() => {
                        setSelected(b.reference);
                        setWalkIn(false);
                      }}
                      className={`flex w-full flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3 text-left hover:bg-navy/5 focus:bg-navy/5 ${selected === b.reference ? 'bg-copper-light/60' : ''}`}
                    >
                      <span className="font-mono font-bold text-navy">{b.reference}</span>
                      <span className="font-semibold">{b.visitorName}</span>
                      {b.walkIn && (
                        <span className="rounded-full bg-navy/10 px-2 py-0.5 text-xs font-bold text-navy">walk-in</span>
                      )}
                      <span className="ml-auto flex flex-wrap gap-2">
                        {b.items.map((i) => (
                          <span key={i.id} className="flex items-center gap-1 text-sm">
                            {i.categoryName}
                            {i.queueNumber !== null && <b className="text-navy">#{i.queueNumber}</b>}{' '}
                            <StatusChip status={i.status} />
                          </span>
                        ))}
                      </span>
                    </button>
                  </li>
                ))}
              </ul>
            )}
          </section>
        );
      })}
    </div>
  );
}

function categoryOptions(categories: Category[] | undefined) {
  return (categories ?? []).map((c) => (
    <option key={c.id} value={c.id}>
      {c.name}
    </option>
  ));
}

function IssuedTags({ eventId, issued, onClose }: { eventId: number; issued: IssuedItem[]; onClose: () => void }) {
  const tagged = issued.filter((i) => i.tagCode && i.status !== 'no-show' && i.status !== 'withdrawn');
  const away = issued.filter((i) => i.status === 'no-show' || i.status === 'withdrawn');
  const title =
    [
      tagged.length ? `Checked in: ${tagged.length} tag${tagged.length === 1 ? '' : 's'}` : '',
      away.length
        ? `${away.length} item${away.length === 1 ? '' : 's'} marked ${away.every((i) => i.status === 'no-show') ? 'did not come' : 'did not come or withdrawn'}`
        : '',
    ]
      .filter(Boolean)
      .join(' · ') || 'Saved';
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => ref.current?.focus(), []);
  return (
    <div ref={ref} tabIndex={-1} className="outline-none">
      <Alert tone="success" title={title}>
        <ul className="my-2 flex flex-wrap gap-3" aria-label="Tags issued">
          {tagged.map((i) => (
            <li key={i.id} className="rounded-lg bg-white px-3 py-2 ring-1 ring-ink/10">
              <span
                className="block font-mono text-2xl font-extrabold tracking-widest text-navy"
                data-testid="issued-tag"
              >
                {i.tagCode}
              </span>
              <span className="text-sm">
                Queue no. <b>{i.queueNumber}</b> ·{' '}
                <Link className="underline" to={paths.tags(eventId, { items: [i.id] })} target="_blank">
                  print this tag
                </Link>
              </span>
            </li>
          ))}
        </ul>
        <div className="flex flex-wrap gap-2">
          {tagged.length > 0 && (
            <Link
              to={paths.tags(eventId, { items: tagged.map((i) => i.id) })}
              target="_blank"
              className="inline-flex min-h-11 items-center rounded-lg bg-copper px-4 font-bold text-white hover:bg-copper-dark"
            >
              Print {tagged.length === 1 ? 'the tag' : 'these tags'}
            </Link>
          )}
          <Button variant="secondary" onClick={onClose}>
            Next visitor
          </Button>
        </div>
      </Alert>
    </div>
  );
}

interface Row {
  arrival: Arrival;
  categoryId: number;
  weight: string;
}

/** Check-in item by item: arrived, did not come or withdrawn; category confirmed or corrected; weight if weighed. */
function CheckInPanel({ desk, booking, onClose }: { desk: DeskView; booking: DeskBooking; onClose: () => void }) {
  const { data: categories } = useCategoriesQuery();
  const checkIn = useCheckIn(desk.event.id);
  const [rows, setRows] = useState<Record<number, Row>>(() =>
    Object.fromEntries(
      booking.items.map((i) => [
        i.id,
        {
          arrival: i.status === 'no-show' || i.status === 'withdrawn' ? i.status : 'arrived',
          categoryId: i.categoryId,
          weight: i.weighedKg?.toString() ?? '',
        },
      ]),
    ),
  );
  const [issued, setIssued] = useState<IssuedItem[] | null>(null);
  const slot = desk.slots.find((s) => s.id === booking.slotId);
  const error = checkIn.error instanceof ApiError ? checkIn.error : null;

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
          const locked = ['at-bench', 'done'].includes(i.status);
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
                    {(['arrived', 'no-show', 'withdrawn'] as const)
                      .filter((a) => a !== 'no-show' || i.status === 'booked' || i.status === 'no-show')
                      .map((a) => (
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
                        {categoryOptions(categories)}
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
                </>
              )}
            </fieldset>
          );
        })}
        <div className="flex flex-wrap gap-2">
          <Button type="submit" busy={checkIn.isPending}>
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

/** A walk-in: the same item questions as booking, fast, with the house rules accepted by a tick and a typed name. */
function WalkInForm({ desk, onDone }: { desk: DeskView; onDone: () => void }) {
  const { data: categories } = useCategoriesQuery();
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
  if (issued) return <IssuedTags eventId={desk.event.id} issued={issued} onClose={onDone} />;
  return (
    <Card className="ring-2 ring-copper">
      <form
        noValidate
        aria-label="Walk-in"
        className="space-y-4"
        onSubmit={form.handleSubmit((values) => {
          setFormError(null);
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
                {...form.register(`items.${n}.categoryId`)}
                error={errs.items?.[n]?.categoryId?.message}
              >
                <option value="">Choose…</option>
                {categoryOptions(categories)}
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
          <Button type="submit" busy={walkIn.isPending}>
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
