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
  type SafetyFault,
} from '../../../../../shared/safety/limits';
import { missingReadings, requiredReadings } from '../../../../../shared/safety/readings';
import {
  safetyCheckSchema,
  visualOk,
  type SafetyCheckInput,
  type SafetyCheckValues,
} from '../../../../../shared/schemas/event-day';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { CheckField, TextField } from '../../../components/ui/field';
import { useRecordSafetyCheck } from '../api/record-safety-check';
import type { ItemView } from '../api/types';
import { TILE_FOCUS } from './radio-tile';
import { tr, useLanguage, useT } from '../../../lib/i18n';

type Reading = 'cordLengthM' | 'protectiveConductorOhm' | 'insulationMOhm' | 'protectiveCurrentMA' | 'touchCurrentMA';
const VISUAL = ['cord', 'plug', 'strainRelief', 'casing', 'noHeatDamage'] as const;

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
type Num = (n: number) => string;
/** Each reading's field: its label (marked optional where the class does not require it) and its limit. */
const READING_FIELDS: Record<Reading, { label: (required: boolean) => string; hint: (l: Limits, n: Num) => string }> = {
  cordLengthM: { label: () => tr('bench.safety.reading.cordLengthM'), hint: () => tr('bench.safety.hint.cord') },
  protectiveConductorOhm: {
    label: () => tr('bench.safety.reading.protectiveConductorOhm'),
    hint: ({ cord }, n) =>
      cord !== undefined && cord >= 0
        ? tr('bench.safety.hint.conductorFor', { limit: n(protectiveConductorLimitOhm(cord)), cord: n(cord) })
        : tr('bench.safety.hint.conductor'),
  },
  insulationMOhm: {
    label: (required) =>
      tr(required ? 'bench.safety.reading.insulationMOhm' : 'bench.safety.reading.insulationOptional'),
    hint: ({ cls, heating }, n) => tr('bench.safety.hint.atLeastMOhm', { limit: n(insulationLimitMOhm(cls, heating)) }),
  },
  protectiveCurrentMA: {
    label: () => tr('bench.safety.reading.protectiveCurrentMA'),
    hint: (_, n) => tr('bench.safety.hint.atMostMA', { limit: n(protectiveCurrentLimitMA()) }),
  },
  touchCurrentMA: {
    label: () => tr('bench.safety.reading.touchCurrentMA'),
    hint: (_, n) => tr('bench.safety.hint.atMostMA', { limit: n(TOUCH_CURRENT_LIMIT_MA) }),
  },
};

/** A fault of shared/safety in the reader's words, its figures in the language's number form. */
export function faultText(f: SafetyFault, heating: boolean, n: Num): string {
  const values = Object.fromEntries(Object.entries(f.values).map(([k, v]) => [k, typeof v === 'number' ? n(v) : v]));
  const key = f.field === 'insulationMOhm' && heating ? 'insulationMOhmHeating' : f.field;
  return tr(`bench.safety.fault.${key}`, values);
}

/**
 * A stored check's faults in the reader's words: worked out again by shared/safety from the readings it kept, so a
 * check recorded in one language reads in another (the stored English sentences are for the record and the export).
 */
function storedFaults(r: SafetyCheckValues, lang: string): string[] {
  const n = (x: number) => x.toLocaleString(lang, { maximumFractionDigits: 3 });
  const { visual, instrument: _instrument, ...readings } = r;
  return safetyFaults({ ...readings, visualOk: visualOk(visual) }).map((f) => faultText(f, r.heating, n));
}

/** A failed stored check's faults as one text; the stored sentences if the readings no longer show them. */
export function storedFaultsText(check: { readings: SafetyCheckValues; failures: string[] }, lang: string): string {
  return storedFaults(check.readings, lang).join(' ') || check.failures.join(' ');
}

/** The check's form: visual inspection, class, readings; the verdict is worked out as you type. */
export function SafetyForm({ item }: { item: ItemView }) {
  const t = useT();
  const lang = useLanguage();
  const n: Num = (x) => x.toLocaleString(lang, { maximumFractionDigits: 3 });
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
      error={
        errors[key] ? t(errors[key]) : Number.isNaN(num(r[key]) as number) ? t('bench.safety.notNumber') : undefined
      }
      hint={hint}
    />
  );
  const submit = () => {
    if (notNumbers.length) {
      setErrors(Object.fromEntries(notNumbers.map((k) => [k, 'bench.safety.notNumber'])));
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
      <h2 className="text-lg">{t('bench.safety.title')}</h2>
      <p className="mb-3 text-sm text-ink-soft">{t('bench.safety.lead', { source: item.safetySource })}</p>
      {latest && (
        <div className="mb-3" data-testid="latest-check">
          <Alert
            tone={latest.pass ? 'success' : 'error'}
            title={
              latest.pass
                ? t('bench.safety.passedAt', { time: formatTime(latest.createdAt, item.event.timeZone, lang) })
                : t('bench.safety.failedAt', { time: formatTime(latest.createdAt, item.event.timeZone, lang) })
            }
          >
            {latest.pass
              ? t('bench.safety.mayBeFixed')
              : `${storedFaultsText(latest, lang)} ${t('bench.safety.cannotGoHome')}`}
          </Alert>
        </div>
      )}
      <fieldset className="space-y-1">
        <legend className="font-bold">{t('bench.safety.visual')}</legend>
        {VISUAL.map((k) => (
          <CheckField
            key={k}
            label={t(`bench.safety.visual.${k}`)}
            checked={visual[k]}
            onChange={(e) => setVisual((v) => ({ ...v, [k]: e.target.checked }))}
          />
        ))}
      </fieldset>
      <fieldset className="mt-3">
        <legend className="font-bold">{t('bench.safety.class')}</legend>
        <div role="radiogroup" className="mt-1 flex gap-2">
          {(['I', 'II', 'III'] as const).map((c) => (
            <label
              key={c}
              className={`flex min-h-11 flex-1 cursor-pointer items-center justify-center rounded-lg ring-1 ${TILE_FOCUS} ${cls === c ? 'bg-navy text-white ring-navy' : 'bg-white ring-ink/20'}`}
            >
              <input type="radio" name="class" className="sr-only" checked={cls === c} onChange={() => setCls(c)} />
              {t('bench.safety.classN', { cls: c })}
            </label>
          ))}
        </div>
        <p className="mt-1 text-xs text-ink-soft">{t('bench.safety.classHint')}</p>
      </fieldset>
      <div className="mt-3">
        <CheckField
          label={t('bench.safety.heating')}
          checked={heating}
          onChange={(e) => setHeating(e.target.checked)}
        />
      </div>
      <div className="mt-3 grid gap-3 sm:grid-cols-2">
        {shown.map((k) => input(k, READING_FIELDS[k].label(required.has(k)), READING_FIELDS[k].hint(limits, n)))}
        <TextField
          label={t('bench.safety.instrument')}
          value={instrument}
          onChange={(e) => setInstrument(e.target.value)}
          placeholder={t('bench.safety.instrumentPlaceholder')}
        />
      </div>
      <div className="mt-3" aria-live="polite" data-testid="verdict">
        {!touched ? (
          <p className="rounded-lg bg-ink/5 px-3 py-2 text-ink-soft">{t('bench.safety.verdict.start')}</p>
        ) : notNumbers.length ? (
          <p className="rounded-lg bg-ink/5 px-3 py-2 text-ink-soft">{t('bench.safety.verdict.notNumber')}</p>
        ) : pass ? (
          <p className="rounded-lg bg-sage-light px-3 py-2 font-bold">{t('bench.safety.verdict.pass')}</p>
        ) : readingFaults.length ? (
          <p className="rounded-lg bg-alert-light px-3 py-2 font-bold text-alert">
            {t('bench.safety.verdict.fails', {
              faults: readingFaults.map((f) => faultText(f, heating, n)).join(' '),
            })}
          </p>
        ) : !allVisual && missing.length === 0 ? (
          <p className="rounded-lg bg-copper-light px-3 py-2 font-semibold text-copper-dark">
            {t('bench.safety.verdict.visualUnticked')}
          </p>
        ) : (
          <p className="rounded-lg bg-ink/5 px-3 py-2 text-ink-soft">
            {t('bench.safety.verdict.needed', {
              list: [
                ...(allVisual ? [] : [t('bench.safety.verdict.visualPoints')]),
                ...missing.map((m) => t(`bench.safety.name.${m.field}`)),
              ].join(', '),
            })}
          </p>
        )}
      </div>
      {record.error && (
        <div className="mt-2">
          <Alert tone="error">{record.error.message}</Alert>
        </div>
      )}
      <Button className="mt-3 w-full" variant="secondary" onClick={submit} busy={record.isPending}>
        {t('bench.safety.record')}
      </Button>
    </Card>
  );
}
