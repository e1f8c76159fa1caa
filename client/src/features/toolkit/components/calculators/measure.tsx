import { useState } from 'react';
import { judgeResistance, parseReading, type MeasureVerdict } from '../../../../../../shared/calculators/measure';
import { parseOhms, TOLERANCE_BY_COLOUR } from '../../../../../../shared/calculators/resistors';
import { SelectField, TextField } from '../../../../components/ui/field';
import {
  attempt,
  bad,
  Big,
  ExampleButton,
  Examples,
  num,
  ohmsError,
  ohmsHint,
  OlButton,
  Prompt,
  Result,
  type Tone,
  useFormats,
} from './ui';
import { useT } from '../../../../lib/i18n';
import { saidIn } from '../said';

// ——— measured resistance ———

const TOLERANCES = [...new Set(Object.values(TOLERANCE_BY_COLOUR))].sort((a, b) => a - b);
const verdictKey = (v: MeasureVerdict) => `bench.calc.measure.${v}`;

export function Measure() {
  const t = useT();
  const { lang, fmt, ohms: formatOhms } = useFormats();
  const [f, setF] = useState({ reading: '', leads: '', nominal: '', tolerance: '5', uncertainty: '' });
  const reading = parseReading(f.reading);
  const leads = num(f.leads);
  const nominal = parseOhms(f.nominal);
  const uncertainty = num(f.uncertainty);
  const readingError = f.reading.trim() !== '' && reading === null ? t('bench.calc.measure.readingError') : undefined;
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
              label={t('bench.calc.measure.reading')}
              inputMode="decimal"
              autoComplete="off"
              value={f.reading}
              onChange={set('reading')}
              error={readingError}
            />
          </div>
          <OlButton label={t('bench.calc.measure.readsOl')} onClick={() => setF((x) => ({ ...x, reading: 'OL' }))} />
        </div>
        <TextField
          label={t('bench.calc.measure.leads')}
          inputMode="decimal"
          autoComplete="off"
          value={f.leads}
          onChange={set('leads')}
          error={bad(f.leads) ? t('bench.calc.measure.numberError') : undefined}
          hint={t('bench.calc.measure.leadsHint')}
        />
        <TextField
          label={t('bench.calc.measure.nominal')}
          inputMode="decimal"
          autoComplete="off"
          value={f.nominal}
          onChange={set('nominal')}
          error={ohmsError(f.nominal)}
          hint={ohmsHint()}
        />
        <SelectField label={t('bench.calc.measure.tolerance')} value={f.tolerance} onChange={set('tolerance')}>
          {TOLERANCES.map((tol) => (
            <option key={tol} value={tol}>
              ±{fmt(tol)} %
            </option>
          ))}
        </SelectField>
        <TextField
          label={t('bench.calc.measure.uncertainty')}
          inputMode="decimal"
          autoComplete="off"
          value={f.uncertainty}
          onChange={set('uncertainty')}
          error={bad(f.uncertainty) ? t('bench.calc.measure.numberError') : undefined}
          hint={t('bench.calc.measure.uncertaintyHint')}
        />
      </div>
      <Result id="measure" tone={tone}>
        {!result ? (
          <Prompt>{t(invalid ? 'bench.calc.fieldNotNumber' : 'bench.calc.measure.prompt')}</Prompt>
        ) : !result.ok ? (
          <p className="font-semibold">{saidIn(result.error, lang)}</p>
        ) : (
          <>
            <Big>{t(verdictKey(result.value.verdict))}</Big>
            {result.value.netOhm !== null && (
              <p>
                {t('bench.calc.measure.net', {
                  net: formatOhms(result.value.netOhm),
                  dev: `${result.value.deviationPct! > 0 ? '+' : ''}${fmt(result.value.deviationPct!, 6)}`,
                  min: formatOhms(result.value.minOhm),
                  max: formatOhms(result.value.maxOhm),
                })}
              </p>
            )}
            <p className="mt-1 text-sm">{saidIn(result.value.said, lang)}</p>
          </>
        )}
      </Result>
      <Examples>
        <ExampleButton
          onClick={() => setF({ reading: '1.2', leads: '0.1', nominal: '1', tolerance: '5', uncertainty: '0.1' })}
        >
          {t('bench.calc.measure.example')}
        </ExampleButton>
      </Examples>
    </>
  );
}
