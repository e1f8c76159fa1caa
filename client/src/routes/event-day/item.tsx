import { useEffect, useState } from 'react';
import { Link, useParams } from 'react-router';
import {
  BARRIERS,
  BARRIER_LABELS,
  OUTCOMES,
  OUTCOME_LABELS,
  type Outcome,
} from '../../../../shared/event-day/constants';
import { formatTime } from '../../../../shared/format';
import {
  insulationLimitMOhm,
  judgeSafety,
  protectiveConductorLimitOhm,
  protectiveCurrentLimitMA,
  TOUCH_CURRENT_LIMIT_MA,
  type ApplianceClass,
} from '../../../../shared/safety/limits';
import {
  outcomeSchema,
  safetyCheckSchema,
  visualOk,
  type OutcomeInput,
  type SafetyCheckInput,
} from '../../../../shared/schemas/event-day';
import { Button } from '../../components/ui/button';
import { Alert, Card, Spinner } from '../../components/ui/feedback';
import { CheckField, SelectField, TextAreaField, TextField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { eventDayKeys } from '../../features/event-day/api/keys';
import { useItem } from '../../features/event-day/api/get-item';
import { photoUrl } from '../../features/event-day/api/photo-url';
import { usePendingOutcomes, useRecordOutcome } from '../../features/event-day/api/record-outcome';
import { useRecordSafetyCheck } from '../../features/event-day/api/record-safety-check';
import { useStartRepair } from '../../features/event-day/api/start-repair';
import { useUploadRepairPhotos } from '../../features/event-day/api/upload-repair-photos';
import type { ItemView } from '../../features/event-day/api/types';
import { StatusChip } from '../../features/event-day/status-chip';
import { useUser } from '../../lib/auth';
import { ConfirmDialog } from '../../components/ui/confirm-dialog';
import { CalculatorLinks, SalvageForItem, SimilarRepairs } from '../../features/toolkit/components/item-toolkit';
import { ApiError } from '../../lib/api';
import { queryClient } from '../../lib/query-client';

/** The fixer's page for one item, phone first: what is wrong, the cautions, start, safety check, outcome. */
export function ItemPage() {
  const id = Number(useParams().itemId);
  const { data: item, isPending, error } = useItem(id);
  if (isPending) return <Spinner />;
  if (error) return <Alert tone="error">{error.message}</Alert>;
  return <ItemView item={item} />;
}

function ItemView({ item }: { item: ItemView }) {
  const start = useStartRepair(item.id);
  const { data: me } = useUser();
  const [confirmTake, setConfirmTake] = useState(false);
  const othersItem = item.placement && me && item.placement.userId !== me.id;
  const started = item.status === 'at-bench' || item.status === 'done';
  const tz = item.event.timeZone;
  const latest = item.safetyChecks[0];
  const [editing, setEditing] = useState(false);
  // A newly saved outcome (now, or sent later from the phone's queue) closes the form.
  useEffect(() => setEditing(false), [item.outcome?.recordedAt]);
  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <header className="space-y-1">
        <p className="text-sm text-ink-soft">
          <Link className="underline" to={paths.bench()}>
            My bench
          </Link>{' '}
          · {item.event.title}
        </p>
        <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
          {item.tagCode && (
            <span className="font-mono text-3xl font-extrabold tracking-widest text-navy" data-testid="tag-code">
              {item.tagCode}
            </span>
          )}
          {item.queueNumber !== null && (
            <span className="rounded-lg bg-navy px-2 py-1 text-lg font-extrabold text-white">
              No. {item.queueNumber}
            </span>
          )}
          <StatusChip status={item.status} />
        </div>
        <h1 className="text-2xl">
          {item.categoryName}
          {(item.brand || item.model) && (
            <span className="font-semibold text-ink-soft"> — {[item.brand, item.model].filter(Boolean).join(' ')}</span>
          )}
        </h1>
        <p className="text-ink-soft">
          {item.booking.visitorName}
          {item.booking.walkIn ? ' (walk-in)' : ''} · about {item.estimatedMinutes} min
          {item.ageYears !== null && ` · ${item.ageYears} years old`}
          {item.placement && (
            <>
              {' '}
              · {item.placement.fixerName}, {item.placement.benchName}
            </>
          )}
        </p>
      </header>

      {item.cautions.length > 0 && (
        <Alert tone="caution" title="Before you open it">
          <ul className="mt-1 list-disc space-y-1 pl-5">
            {item.cautions.map((c) => (
              <li key={c.id}>
                <b>{c.title}.</b> {c.text}
              </li>
            ))}
          </ul>
          <p className="mt-2 text-xs">
            {item.safetyNote}{' '}
            <Link to={paths.safety()} className="underline">
              Safety at the bench
            </Link>
          </p>
        </Alert>
      )}

      <Card>
        <h2 className="mb-1 text-lg">What the visitor says</h2>
        <p className="whitespace-pre-line">{item.fault}</p>
        {item.photos.some((p) => p.kind === 'intake') && (
          <div className="mt-3 flex flex-wrap gap-2">
            {item.photos
              .filter((p) => p.kind === 'intake')
              .map((p) => (
                <a key={p.id} href={photoUrl(p.id)} target="_blank" rel="noreferrer">
                  <img
                    src={photoUrl(p.id)}
                    alt={`Photo of the ${item.categoryName.toLowerCase()}`}
                    className="size-24 rounded-lg object-cover"
                  />
                </a>
              ))}
          </div>
        )}
      </Card>

      <SimilarRepairs item={item} />

      {item.can.start && !started && (
        <div className="space-y-2">
          {othersItem && (
            <Alert>The plan gives this item to {item.placement!.fixerName}. Starting it makes it yours.</Alert>
          )}
          <Button
            className="w-full text-lg"
            onClick={() => (othersItem ? setConfirmTake(true) : start.mutate())}
            busy={start.isPending}
          >
            Start repair
          </Button>
          <p className="text-center text-sm text-ink-soft">
            The safety check and the outcome open once the repair has started.
          </p>
        </div>
      )}
      <ConfirmDialog
        open={confirmTake}
        tone="primary"
        title="Take over this item?"
        message={`It is planned for ${item.placement?.fixerName ?? 'another fixer'}. Tell them you have it, so nobody waits for it.`}
        confirmLabel="Take it"
        cancelLabel="Leave it"
        onCancel={() => setConfirmTake(false)}
        onConfirm={() => {
          setConfirmTake(false);
          start.mutate();
        }}
      />
      {start.error && <Alert tone="error">{start.error.message}</Alert>}

      {item.mains &&
        ((started && !(item.status === 'done' && item.outcome?.outcome !== 'fixed')) ||
          item.safetyChecks.length > 0) && <SafetySection item={item} />}

      {!started && !item.outcome ? null : item.outcome && !editing ? (
        <Card className={item.outcome.outcome === 'fixed' ? 'ring-2 ring-sage' : ''}>
          <h2 className="text-lg">Outcome: {item.outcome.outcomeLabel}</h2>
          {item.outcome.barrierLabel && <p>Barrier: {item.outcome.barrierLabel}</p>}
          {item.outcome.partDescription && (
            <p>
              Part needed: {item.outcome.partDescription}
              {item.outcome.partCost !== null && ` (estimated cost ${item.outcome.partCost.toFixed(2)})`}
              {item.outcome.partLink && (
                <>
                  {' '}
                  ·{' '}
                  <a className="underline" href={item.outcome.partLink} target="_blank" rel="noreferrer">
                    link
                  </a>
                </>
              )}
            </p>
          )}
          {item.outcome.minutes !== null && <p>{item.outcome.minutes} minutes</p>}
          {item.outcome.notes && <p className="whitespace-pre-line text-ink-soft">{item.outcome.notes}</p>}
          <p className="text-sm text-ink-soft">
            Recorded {formatTime(item.outcome.recordedAt, tz)}
            {item.outcome.recordedByName && ` by ${item.outcome.recordedByName}`}
          </p>
          {item.can.record && (
            <Button variant="secondary" className="mt-2" onClick={() => setEditing(true)}>
              Correct the outcome
            </Button>
          )}
        </Card>
      ) : item.can.record ? (
        <OutcomeForm
          item={item}
          latestPass={latest?.pass ?? null}
          onCancel={item.outcome ? () => setEditing(false) : undefined}
        />
      ) : (
        <Alert>
          This item is with {item.placement?.fixerName ?? 'another fixer'}. An organiser can move it to you.
        </Alert>
      )}

      {(item.can.record || item.photos.some((p) => p.kind === 'repair')) && <RepairPhotos item={item} />}
      {(started || item.partsUsed.length > 0) && (
        <SalvageForItem
          item={item}
          onChanged={() => void queryClient.invalidateQueries({ queryKey: eventDayKeys.item(item.id) })}
        />
      )}
      <CalculatorLinks item={item} />

      <details className="rounded-xl bg-white p-4 ring-1 ring-ink/5">
        <summary className="cursor-pointer font-bold">History ({item.history.length})</summary>
        <ol className="mt-2 space-y-1 text-sm">
          {item.history.map((h, n) => (
            <li key={n}>
              <span className="font-mono">{formatTime(h.at, tz)}</span> {h.toLabel}
              {h.byName && ` — ${h.byName}`}
              {h.note && <span className="text-ink-soft"> ({h.note})</span>}
            </li>
          ))}
        </ol>
      </details>
    </div>
  );
}

/** Photos from the bench (the fault, a part number, the finished repair) for the knowledge base. */
function RepairPhotos({ item }: { item: ItemView }) {
  const upload = useUploadRepairPhotos(item.id);
  const photos = item.photos.filter((p) => p.kind === 'repair');
  return (
    <Card>
      <h2 className="text-lg">Repair photos</h2>
      <p className="mb-2 text-sm text-ink-soft">
        The fault, a part number, the finished repair. At most 3; no faces, please.
      </p>
      {photos.length > 0 && (
        <div className="mb-3 flex flex-wrap gap-2">
          {photos.map((p) => (
            <a key={p.id} href={photoUrl(p.id)} target="_blank" rel="noreferrer">
              <img src={photoUrl(p.id)} alt="Repair photo" className="size-24 rounded-lg object-cover" />
            </a>
          ))}
        </div>
      )}
      {item.can.record && photos.length < 3 && (
        <label className="flex min-h-11 cursor-pointer items-center justify-center rounded-lg bg-white font-bold text-navy ring-1 ring-navy/25 hover:bg-navy/5">
          {upload.isPending ? 'Uploading…' : 'Add photos'}
          <input
            type="file"
            accept="image/jpeg,image/png,image/webp"
            capture="environment"
            multiple
            className="sr-only"
            onChange={(e) => {
              if (e.target.files?.length) upload.mutate(e.target.files);
              e.target.value = '';
            }}
          />
        </label>
      )}
      {upload.error && (
        <div className="mt-2">
          <Alert tone="error">{upload.error.message}</Alert>
        </div>
      )}
    </Card>
  );
}

type Reading = 'cordLengthM' | 'protectiveConductorOhm' | 'insulationMOhm' | 'protectiveCurrentMA' | 'touchCurrentMA';
const VISUAL = [
  ['cord', 'Cord: no cuts, kinks or bare wire'],
  ['plug', 'Plug: pins, fuse and terminals sound'],
  ['strainRelief', 'Strain relief holds the cord at both ends'],
  ['casing', 'Casing: no cracks, screws all in'],
  ['noHeatDamage', 'No scorch marks, melting or smell of heat'],
] as const;

/** A typed reading: undefined when empty, NaN when it is not a number (shown as an error, never judged). */
const num = (s: string) => (s.trim() === '' ? undefined : Number(s.trim().replace(',', '.')));
const RELEVANT: Record<ApplianceClass, Reading[]> = {
  I: ['cordLengthM', 'protectiveConductorOhm', 'insulationMOhm', 'protectiveCurrentMA'],
  II: ['insulationMOhm', 'touchCurrentMA'],
  III: ['insulationMOhm'],
};
/** Tiles that are radio buttons: the focus ring shows on the tile. */
const TILE_FOCUS = 'has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-copper has-[:focus-visible]:ring-offset-2';

/** The electrical safety check: visual inspection, class, readings; the verdict is worked out as you type. */
function SafetySection({ item }: { item: ItemView }) {
  const latest = item.safetyChecks[0];
  const closed = (l: typeof latest) => Boolean(l) && (l!.pass || item.status === 'done');
  const [open, setOpen] = useState(!closed(latest));
  useEffect(() => setOpen(!closed(latest)), [latest?.id, latest?.pass, item.status]);
  if (!open && latest) {
    return (
      <Card>
        <h2 className="text-lg">Electrical safety check</h2>
        <div className="my-3" data-testid="latest-check">
          <Alert
            tone={latest.pass ? 'success' : 'error'}
            title={`${latest.pass ? 'Passed' : 'Failed'} at ${formatTime(latest.createdAt, item.event.timeZone)}`}
          >
            Class {latest.applianceClass}
            {latest.instrument && `, ${latest.instrument}`}
            {latest.checkedByName && `, by ${latest.checkedByName}`}. {!latest.pass && latest.failures.join(' ')}{' '}
            {item.safetyChecks.length > 1 &&
              `${item.safetyChecks.length - 1} earlier check${item.safetyChecks.length > 2 ? 's' : ''} on record.`}
          </Alert>
        </div>
        {item.status !== 'done' && (
          <Button variant="secondary" className="w-full" onClick={() => setOpen(true)}>
            Record another check
          </Button>
        )}
      </Card>
    );
  }
  return <SafetyForm item={item} />;
}

function SafetyForm({ item }: { item: ItemView }) {
  const record = useRecordSafetyCheck(item.id);
  const [visual, setVisual] = useState({
    cord: false,
    plug: false,
    strainRelief: false,
    casing: false,
    noHeatDamage: false,
  });
  const [cls, setCls] = useState<ApplianceClass>('I');
  const [heating, setHeating] = useState(item.heating);
  const [r, setR] = useState<Record<Reading, string>>({
    cordLengthM: '',
    protectiveConductorOhm: '',
    insulationMOhm: '',
    protectiveCurrentMA: '',
    touchCurrentMA: '',
  });
  const [instrument, setInstrument] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const latest = item.safetyChecks[0];
  // Only the readings the chosen class asks for count; a hidden field never decides the verdict.
  const values = Object.fromEntries(RELEVANT[cls].map((k) => [k, num(r[k])])) as Partial<Record<Reading, number>>;
  const notNumbers = RELEVANT[cls].filter((k) => Number.isNaN(values[k] as number));
  const verdict = judgeSafety({ visualOk: visualOk(visual), applianceClass: cls, heating, ...values });
  const touched = Object.values(visual).some(Boolean) || RELEVANT[cls].some((k) => r[k].trim() !== '');
  const allVisual = visualOk(visual);
  const cord = values.cordLengthM;
  const input = (key: Reading, label: string, hint: string) => (
    <TextField
      label={label}
      inputMode="decimal"
      value={r[key]}
      onChange={(e) => setR((x) => ({ ...x, [key]: e.target.value }))}
      error={errors[key] ?? (Number.isNaN(num(r[key]) as number) ? 'Enter a number, e.g. 0.12.' : undefined)}
      hint={hint}
    />
  );
  const submit = () => {
    if (notNumbers.length) {
      setErrors(Object.fromEntries(notNumbers.map((k) => [k, 'Enter a number, e.g. 0.12.'])));
      return;
    }
    const body: SafetyCheckInput = {
      visual,
      applianceClass: cls,
      heating,
      ...values,
      instrument: instrument || undefined,
    };
    const parsed = safetyCheckSchema.safeParse(body);
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [i.path.join('.'), i.message])));
      return;
    }
    setErrors({});
    record.mutate(body);
  };
  return (
    <Card>
      <h2 className="text-lg">Electrical safety check</h2>
      <p className="mb-3 text-sm text-ink-soft">Before a mains item goes home. Limits: {item.safetySource}.</p>
      {latest && (
        <div className="mb-3" data-testid="latest-check">
          <Alert
            tone={latest.pass ? 'success' : 'error'}
            title={
              latest.pass
                ? `Passed at ${formatTime(latest.createdAt, item.event.timeZone)}`
                : `Failed at ${formatTime(latest.createdAt, item.event.timeZone)}`
            }
          >
            {latest.pass ? (
              'It may be recorded as fixed.'
            ) : (
              <>
                {latest.failures.join(' ')} It cannot go home as fixed: record it as needing a part, or as end of life —
                or repair it and check again.
              </>
            )}
          </Alert>
        </div>
      )}
      <fieldset className="space-y-1">
        <legend className="font-bold">Visual inspection</legend>
        {VISUAL.map(([k, label]) => (
          <CheckField
            key={k}
            label={label}
            checked={visual[k]}
            onChange={(e) => setVisual((v) => ({ ...v, [k]: e.target.checked }))}
          />
        ))}
      </fieldset>
      <fieldset className="mt-3">
        <legend className="font-bold">Appliance class</legend>
        <div role="radiogroup" className="mt-1 flex gap-2">
          {(['I', 'II', 'III'] as const).map((c) => (
            <label
              key={c}
              className={`flex min-h-11 flex-1 cursor-pointer items-center justify-center rounded-lg ring-1 ${TILE_FOCUS} ${cls === c ? 'bg-navy text-white ring-navy' : 'bg-white ring-ink/20'}`}
            >
              <input type="radio" name="class" className="sr-only" checked={cls === c} onChange={() => setCls(c)} />
              Class {c}
            </label>
          ))}
        </div>
        <p className="mt-1 text-xs text-ink-soft">
          I: earthed metal parts (three-core cord). II: double insulated (the square-in-square mark). III: runs on
          safety extra-low voltage.
        </p>
      </fieldset>
      <div className="mt-3">
        <CheckField label="Has heating elements" checked={heating} onChange={(e) => setHeating(e.target.checked)} />
      </div>
      <div className="mt-3 grid gap-3 sm:grid-cols-2">
        {cls === 'I' && input('cordLengthM', 'Cord length (m)', 'Sets the protective conductor limit.')}
        {cls === 'I' &&
          input(
            'protectiveConductorOhm',
            'Protective conductor resistance (Ω)',
            cord !== undefined && cord >= 0
              ? `Limit ${protectiveConductorLimitOhm(cord)} Ω for ${cord} m.`
              : 'Limit 0.3 Ω up to 5 m of cord.',
          )}
        {cls !== 'III' &&
          input(
            'insulationMOhm',
            'Insulation resistance at 500 V DC (MΩ)',
            `At least ${insulationLimitMOhm(cls, heating)} MΩ.`,
          )}
        {cls === 'III' &&
          input('insulationMOhm', 'Insulation resistance (MΩ, optional)', `At least ${insulationLimitMOhm(cls)} MΩ.`)}
        {cls === 'I' &&
          input(
            'protectiveCurrentMA',
            'Protective conductor current (mA, optional)',
            `At most ${protectiveCurrentLimitMA()} mA.`,
          )}
        {cls === 'II' &&
          input('touchCurrentMA', 'Touch current (mA, optional)', `At most ${TOUCH_CURRENT_LIMIT_MA} mA.`)}
        <TextField
          label="Instrument used"
          value={instrument}
          onChange={(e) => setInstrument(e.target.value)}
          placeholder="e.g. the group’s appliance tester"
        />
      </div>
      <div className="mt-3" aria-live="polite" data-testid="verdict">
        {!touched ? (
          <p className="rounded-lg bg-ink/5 px-3 py-2 text-ink-soft">
            Tick the visual checks and enter the readings; the verdict appears here as you type.
          </p>
        ) : notNumbers.length ? (
          <p className="rounded-lg bg-ink/5 px-3 py-2 text-ink-soft">
            A reading is not a number; correct it to see the verdict.
          </p>
        ) : verdict.pass ? (
          <p className="rounded-lg bg-sage-light px-3 py-2 font-bold">These readings pass.</p>
        ) : verdict.failures.filter((f) => allVisual || !f.startsWith('The visual')).length ? (
          <p className="rounded-lg bg-alert-light px-3 py-2 font-bold text-alert">
            Fails: {verdict.failures.filter((f) => allVisual || !f.startsWith('The visual')).join(' ')}
          </p>
        ) : !allVisual && verdict.missing.length === 0 ? (
          <p className="rounded-lg bg-copper-light px-3 py-2 font-semibold text-copper-dark">
            The readings are within limits, but not every visual point is ticked: an unticked point is recorded as a
            fault.
          </p>
        ) : (
          <p className="rounded-lg bg-ink/5 px-3 py-2 text-ink-soft">
            Still needed: {[...(allVisual ? [] : ['the visual points']), ...verdict.missing].join(', ')}.
          </p>
        )}
      </div>
      {record.error && (
        <div className="mt-2">
          <Alert tone="error">{record.error.message}</Alert>
        </div>
      )}
      <Button className="mt-3 w-full" variant="secondary" onClick={submit} busy={record.isPending}>
        Record this check
      </Button>
    </Card>
  );
}

/** The outcome, sent through the persisted mutation so it survives a dropped connection. */
function OutcomeForm({
  item,
  latestPass,
  onCancel,
}: {
  item: ItemView;
  latestPass: boolean | null;
  onCancel?: () => void;
}) {
  const [outcome, setOutcome] = useState<Outcome | null>(item.outcome?.outcome ?? null);
  const [barrier, setBarrier] = useState(item.outcome?.barrier ?? '');
  const [part, setPart] = useState({
    description: item.outcome?.partDescription ?? '',
    link: item.outcome?.partLink ?? '',
    cost: item.outcome?.partCost?.toString() ?? '',
  });
  const [minutes, setMinutes] = useState(item.outcome?.minutes?.toString() ?? '');
  const [notes, setNotes] = useState(item.outcome?.notes ?? '');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useRecordOutcome();
  const pending = usePendingOutcomes(item.id);
  const blocked = outcome === 'fixed' && item.mains && latestPass !== true;
  const serverError = save.error instanceof ApiError ? save.error : null;

  const submit = () => {
    const body: OutcomeInput = {
      outcome: outcome ?? (undefined as never),
      barrier: outcome === 'end-of-life' ? ((barrier || undefined) as OutcomeInput['barrier']) : undefined,
      part:
        outcome === 'parts-needed'
          ? {
              description: part.description,
              link: part.link || undefined,
              cost: part.cost.replace(',', '.') || undefined,
            }
          : undefined,
      minutes: minutes || undefined,
      notes: notes || undefined,
    };
    const parsed = outcomeSchema.safeParse(body);
    // The cross-field rules are checked here too, so every message shows in one round.
    const extra: Record<string, string> = {};
    if (outcome === 'end-of-life' && !barrier) extra.barrier = 'Choose the barrier to repair for an end-of-life item.';
    if (outcome === 'parts-needed' && part.description.trim().length < 2)
      extra['part.description'] = 'Say which part is needed.';
    if (!parsed.success || Object.keys(extra).length) {
      setErrors({
        ...extra,
        ...Object.fromEntries((parsed.error?.issues ?? []).map((i) => [i.path.join('.'), i.message])),
      });
      return;
    }
    setErrors({});
    save.mutate({ itemId: item.id, body });
  };

  return (
    <Card>
      <h2 className="mb-2 text-lg">{onCancel ? 'Correct the outcome' : 'Record the outcome'}</h2>
      {pending.some((p) => p.paused) && (
        <div className="mb-3" data-testid="pending-outcome">
          <Alert tone="caution" title="Saved on this phone — not sent yet">
            No connection. The outcome will be sent by itself when the network is back; keep this page or come back to
            it later.
          </Alert>
        </div>
      )}
      {pending.length > 0 && !pending.some((p) => p.paused) && <p className="mb-2 text-sm text-ink-soft">Sending…</p>}
      <div role="radiogroup" aria-label="Outcome" className="grid grid-cols-2 gap-2">
        {OUTCOMES.map((o) => (
          <label
            key={o}
            className={`flex min-h-14 cursor-pointer items-center justify-center rounded-lg px-2 text-center font-bold ring-1 ${TILE_FOCUS} ${outcome === o ? 'bg-navy text-white ring-navy' : 'bg-white ring-ink/20'}`}
          >
            <input
              type="radio"
              name="outcome"
              className="sr-only"
              checked={outcome === o}
              onChange={() => setOutcome(o)}
            />
            {OUTCOME_LABELS[o]}
          </label>
        ))}
      </div>
      {errors.outcome && <p className="mt-1 text-sm font-semibold text-alert">{errors.outcome}</p>}
      {blocked && (
        <div className="mt-3">
          <Alert tone="caution">
            A mains item needs a passing safety check before it is recorded as fixed
            {latestPass === false ? '; the latest one failed, so record it as needing a part or as end of life' : ''}.
          </Alert>
        </div>
      )}
      <div className="mt-3 space-y-3">
        {outcome === 'end-of-life' && (
          <SelectField
            label="Barrier to repair"
            value={barrier}
            onChange={(e) => setBarrier(e.target.value as typeof barrier)}
            error={errors.barrier}
          >
            <option value="">Choose…</option>
            {BARRIERS.map((b) => (
              <option key={b} value={b}>
                {BARRIER_LABELS[b]}
              </option>
            ))}
          </SelectField>
        )}
        {outcome === 'parts-needed' && (
          <>
            <TextField
              label="Which part"
              value={part.description}
              onChange={(e) => setPart((p) => ({ ...p, description: e.target.value }))}
              error={errors['part.description']}
              placeholder="e.g. thermostat 13 A, part no. on the old one"
            />
            <div className="grid gap-3 sm:grid-cols-2">
              <TextField
                label="Supplier link or part number (optional)"
                value={part.link}
                onChange={(e) => setPart((p) => ({ ...p, link: e.target.value }))}
              />
              <TextField
                label="Estimated cost (optional)"
                inputMode="decimal"
                value={part.cost}
                onChange={(e) => setPart((p) => ({ ...p, cost: e.target.value }))}
                error={errors['part.cost']}
              />
            </div>
            <p className="text-sm text-ink-soft">
              The visitor orders the part and comes back to a later session. Look in the salvage stock below first: a
              saved part may do.
            </p>
          </>
        )}
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField
            label="Time spent (minutes)"
            inputMode="numeric"
            value={minutes}
            onChange={(e) => setMinutes(e.target.value)}
            error={errors.minutes}
          />
        </div>
        <TextAreaField
          label="Notes for the next fixer (optional)"
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
          hint="What you measured, the faulty part, the fix."
        />
      </div>
      {serverError && (
        <div className="mt-3">
          <Alert tone="error">{serverError.message}</Alert>
        </div>
      )}
      <Button
        className="mt-3 w-full text-lg"
        onClick={submit}
        busy={save.isPending && !save.isPaused}
        disabled={blocked}
      >
        Save outcome
      </Button>
      {onCancel && (
        <Button variant="secondary" className="mt-2 w-full" onClick={onCancel}>
          Cancel
        </Button>
      )}
    </Card>
  );
}
