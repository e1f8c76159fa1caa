import { useState } from 'react';
import { formatTime } from '../../../../../shared/format';
import {
  insulationLimitMOhm,
  judgeSafety,
  protectiveConductorLimitOhm,
  protectiveCurrentLimitMA,
  TOUCH_CURRENT_LIMIT_MA,
  type ApplianceClass,
} from '../../../../../shared/safety/limits';
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
const RELEVANT: Record<ApplianceClass, Reading[]> = {
  I: ['cordLengthM', 'protectiveConductorOhm', 'insulationMOhm', 'protectiveCurrentMA'],
  II: ['insulationMOhm', 'touchCurrentMA'],
  III: ['insulationMOhm'],
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
