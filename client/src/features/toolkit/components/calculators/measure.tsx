import { useState } from 'react';
import { judgeResistance, parseReading, type MeasureVerdict } from '../../../../../../shared/calculators/measure';
import { formatOhms, parseOhms, TOLERANCE_BY_COLOUR } from '../../../../../../shared/calculators/resistors';
import { SelectField, TextField } from '../../../../components/ui/field';
import {
  attempt,
  bad,
  Big,
  ExampleButton,
  Examples,
  num,
  OHMS_HINT,
  ohmsError,
  OlButton,
  Prompt,
  Result,
  type Tone,
} from './ui';

// ——— measured resistance ———

const TOLERANCES = [...new Set(Object.values(TOLERANCE_BY_COLOUR))].sort((a, b) => a - b);
const VERDICT_TEXT: Record<MeasureVerdict, string> = {
  within: 'Within tolerance',
  'within-uncertainty': 'In the right range',
  outside: 'Outside tolerance',
  open: 'Open circuit',
};

export function Measure() {
  const [f, setF] = useState({ reading: '', leads: '', nominal: '', tolerance: '5', uncertainty: '' });
  const reading = parseReading(f.reading);
  const leads = num(f.leads);
  const nominal = parseOhms(f.nominal);
  const uncertainty = num(f.uncertainty);
  const readingError =
    f.reading.trim() !== '' && reading === null ? 'Enter ohms, or OL when the meter shows OL.' : undefined;
  const invalid = Boolean(readingError) || [leads, nominal, uncertainty].some((x) => Number.isNaN(x as number));
  const result =
    reading !== null && nominal !== undefined && !invalid
      ? attempt(() =>
          judgeResistance({
            reading,
            leadsOhm: leads,
            nominalOhm: nominal,
            tolerancePct: Number(f.tolerance),
            uncertaintyOhm: uncertainty,
          }),
        )
      : null;
  const set = (key: keyof typeof f) => (e: { target: { value: string } }) =>
    setF((x) => ({ ...x, [key]: e.target.value }));
  const tone: Tone = !result
    ? 'neutral'
    : !result.ok
      ? 'bad'
      : result.value.verdict === 'within'
        ? 'good'
        : result.value.verdict === 'within-uncertainty'
          ? 'caution'
          : 'bad';
  return (
    <>
      <div className="grid gap-3 sm:grid-cols-2">
        <div className="flex items-start gap-2">
          <div className="flex-1">
            <TextField
              label="Meter reads (Ω or OL)"
              inputMode="decimal"
              autoComplete="off"
              value={f.reading}
              onChange={set('reading')}
              error={readingError}
            />
          </div>
          <OlButton label="Meter reads OL" onClick={() => setF((x) => ({ ...x, reading: 'OL' }))} />
        </div>
        <TextField
          label="Leads shorted read (Ω)"
          inputMode="decimal"
          autoComplete="off"
          value={f.leads}
          onChange={set('leads')}
          error={bad(f.leads) ? 'Enter a number, e.g. 0.1.' : undefined}
          hint="Touch the probes together first; often about 0.1 Ω."
        />
        <TextField
          label="Nominal value (Ω)"
          inputMode="decimal"
          autoComplete="off"
          value={f.nominal}
          onChange={set('nominal')}
          error={ohmsError(f.nominal)}
          hint={OHMS_HINT}
        />
        <SelectField label="Part tolerance" value={f.tolerance} onChange={set('tolerance')}>
          {TOLERANCES.map((t) => (
            <option key={t} value={t}>
              ±{t} %
            </option>
          ))}
        </SelectField>
        <TextField
          label="Meter uncertainty (Ω, optional)"
          inputMode="decimal"
          autoComplete="off"
          value={f.uncertainty}
          onChange={set('uncertainty')}
          error={bad(f.uncertainty) ? 'Enter a number, e.g. 0.1.' : undefined}
          hint="At least the last digit on this range; twice that once the leads are subtracted."
        />
      </div>
      <Result id="measure" tone={tone}>
        {!result ? (
          <Prompt>
            {invalid
              ? 'A field is not a number; correct it to see the result.'
              : 'Enter the reading and the nominal value.'}
          </Prompt>
        ) : !result.ok ? (
          <p className="font-semibold">{result.error}</p>
        ) : (
          <>
            <Big>{VERDICT_TEXT[result.value.verdict]}</Big>
            {result.value.netOhm !== null && (
              <p>
                Net {formatOhms(result.value.netOhm)} ({result.value.deviationPct! > 0 ? '+' : ''}
                {result.value.deviationPct} %); tolerance band {formatOhms(result.value.minOhm)}–
                {formatOhms(result.value.maxOhm)}.
              </p>
            )}
            <p className="mt-1 text-sm">{result.value.message}</p>
          </>
        )}
      </Result>
      <Examples>
        <ExampleButton
          onClick={() => setF({ reading: '1.2', leads: '0.1', nominal: '1', tolerance: '5', uncertainty: '0.1' })}
        >
          Worked example: 1 Ω reading 1.2 Ω
        </ExampleButton>
      </Examples>
    </>
  );
}
