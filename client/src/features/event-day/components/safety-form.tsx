import { useState } from 'react';
import { formatTime } from '../../../../../shared/format';
import {
  insulationLimitMOhm,
  safetyFaults,
  SAFETY_FAULTS,
  protectiveConductorLimitOhm,
  protectiveCurrentLimitMA,
  TOUCH_CURRENT_LIMIT_MA,
  type ApplianceClass,
} from '../../../../../shared/safety/limits';
import { missingReadings, requiredReadings } from '../../../../../shared/safety/readings';
import { safetyCheckSchema, visualOk, type SafetyCheckInput } from '../../../../../shared/schemas/event-day';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { CheckField, TextField } from '../../../components/ui/field';
import { useRecordSafetyCheck } from '../api/record-safety-check';
import type { ItemView } from '../api/types';
import { TILE_FOCUS } from './radio-tile';

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
/** Readings the form also offers for a class though it does not require them; one taken is still judged. */
const OPTIONAL_READINGS: Record<ApplianceClass, Reading[]> = {
  I: ['protectiveCurrentMA'],
  II: ['touchCurrentMA'],
  III: ['insulationMOhm'],
};
/** The class's readings in the form's order: what shared/safety requires, then the optional ones. */
const readingsFor = (cls: ApplianceClass): Reading[] => [...requiredReadings(cls), ...OPTIONAL_READINGS[cls]];

interface Limits {
  cls: ApplianceClass;
  heating: boolean;
  cord: number | undefined;
}
/** Each reading's field: its label (marked optional where the class does not require it) and its limit. */
const READING_FIELDS: Record<Reading, { label: (required: boolean) => string; hint: (l: Limits) => string }> = {
  cordLengthM: { label: () => 'Cord length (m)', hint: () => 'Sets the protective conductor limit.' },
  protectiveConductorOhm: {
    label: () => 'Protective conductor resistance (Ω)',
    hint: ({ cord }) =>
      cord !== undefined && cord >= 0
        ? `Limit ${protectiveConductorLimitOhm(cord)} Ω for ${cord} m.`
        : 'Limit 0.3 Ω up to 5 m of cord.',
  },
  insulationMOhm: {
    label: (required) => (required ? 'Insulation resistance at 500 V DC (MΩ)' : 'Insulation resistance (MΩ, optional)'),
    hint: ({ cls, heating }) => `At least ${insulationLimitMOhm(cls, heating)} MΩ.`,
  },
  protectiveCurrentMA: {
    label: () => 'Protective conductor current (mA, optional)',
    hint: () => `At most ${protectiveCurrentLimitMA()} mA.`,
  },
  touchCurrentMA: {
    label: () => 'Touch current (mA, optional)',
    hint: () => `At most ${TOUCH_CURRENT_LIMIT_MA} mA.`,
  },
};

/** The check's form: visual inspection, class, readings; the verdict is worked out as you type. */
export function SafetyForm({ item }: { item: ItemView }) {
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
  const shown = readingsFor(cls);
  const values = Object.fromEntries(shown.map((k) => [k, num(r[k])])) as Partial<Record<Reading, number>>;
  const notNumbers = shown.filter((k) => Number.isNaN(values[k] as number));
  const allVisual = visualOk(visual);
  // The verdict of shared/safety: faults by code (the visual one is shown apart), missing readings by field.
  const faults = safetyFaults({ visualOk: allVisual, applianceClass: cls, heating, ...values });
  const readingFaults = faults.filter((f) => f.code !== SAFETY_FAULTS.visual);
  const missing = missingReadings({ applianceClass: cls, ...values });
  const pass = faults.length === 0 && missing.length === 0;
  const touched = Object.values(visual).some(Boolean) || shown.some((k) => r[k].trim() !== '');
  const required = new Set<Reading>(requiredReadings(cls));
  const limits = { cls, heating, cord: values.cordLengthM };
  const input = (key: Reading, label: string, hint: string) => (
    <TextField
      key={key}
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
                {latest.failures.join(' ')} It cannot go home as fixed: record it as needing a part, or as beyond
                mending — or repair it and check again.
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
        {shown.map((k) => input(k, READING_FIELDS[k].label(required.has(k)), READING_FIELDS[k].hint(limits)))}
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
        ) : pass ? (
          <p className="rounded-lg bg-sage-light px-3 py-2 font-bold">These readings pass.</p>
        ) : readingFaults.length ? (
          <p className="rounded-lg bg-alert-light px-3 py-2 font-bold text-alert">
            Fails: {readingFaults.map((f) => f.message).join(' ')}
          </p>
        ) : !allVisual && missing.length === 0 ? (
          <p className="rounded-lg bg-copper-light px-3 py-2 font-semibold text-copper-dark">
            The readings are within limits, but not every visual point is ticked: an unticked point is recorded as a
            fault.
          </p>
        ) : (
          <p className="rounded-lg bg-ink/5 px-3 py-2 text-ink-soft">
            Still needed: {[...(allVisual ? [] : ['the visual points']), ...missing.map((m) => m.name)].join(', ')}.
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
