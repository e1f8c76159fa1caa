import { useState } from 'react';
import { parseReading } from '../../../../../../shared/calculators/measure';
import {
  interpretDiodeTest,
  PROBE_PAIRS,
  type DiodeReadings,
  type ProbePair,
} from '../../../../../../shared/calculators/transistors';
import { TextField } from '../../../../components/ui/field';
import { attempt, Big, ExampleButton, Examples, OlButton, Prompt, Result } from './ui';
import { useLanguage, useT } from '../../../../lib/i18n';
import { saidIn } from '../said';

// ——— diode test ———

const EMPTY_READINGS: Record<ProbePair, string> = { BE: '', EB: '', BC: '', CB: '', CE: '', EC: '' };
const GOOD_NPN: Record<ProbePair, string> = { BE: '0.65', EB: 'OL', BC: '0.62', CB: 'OL', CE: 'OL', EC: 'OL' };
const SHORT_BC: Record<ProbePair, string> = { BE: '0.66', EB: 'OL', BC: '0.002', CB: '0.003', CE: '0.66', EC: 'OL' };

export function DiodeTest() {
  const t = useT();
  const lang = useLanguage();
  const [r, setR] = useState(EMPTY_READINGS);
  const lead = (l: string) => t(`bench.calc.diode.${l}`);
  const parsed = PROBE_PAIRS.map((p) => [p, parseReading(r[p])] as const);
  const errors = Object.fromEntries(
    parsed.filter(([p, v]) => r[p].trim() !== '' && v === null).map(([p]) => [p, t('bench.calc.diode.voltsOrOl')]),
  );
  const complete = parsed.every(([, v]) => v !== null);
  const result = complete ? attempt(() => interpretDiodeTest(Object.fromEntries(parsed) as DiodeReadings)) : null;
  const verdict = result?.ok ? result.value.verdict : null;
  return (
    <>
      <p className="text-sm text-ink-soft">{t('bench.calc.diode.lead')}</p>
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        {PROBE_PAIRS.map((p) => (
          <div key={p} className="flex items-start gap-2">
            <div className="flex-1">
              <TextField
                label={t('bench.calc.diode.pair', { red: p[0], black: p[1] })}
                inputMode="decimal"
                autoComplete="off"
                value={r[p]}
                onChange={(e) => setR((x) => ({ ...x, [p]: e.target.value }))}
                error={errors[p]}
              />
            </div>
            <OlButton
              label={t('bench.calc.diode.pairOl', { red: lead(p[0]), black: lead(p[1]) })}
              onClick={() => setR((x) => ({ ...x, [p]: 'OL' }))}
            />
          </div>
        ))}
      </div>
      <Result
        id="diode-test"
        tone={
          !result ? 'neutral' : !result.ok || verdict === 'failed' ? 'bad' : verdict === 'good' ? 'good' : 'caution'
        }
      >
        {!result ? (
          <Prompt>{t('bench.calc.diode.prompt')}</Prompt>
        ) : !result.ok ? (
          <p className="font-semibold">{saidIn(result.error, lang)}</p>
        ) : (
          <>
            <Big>
              {t(`bench.calc.diode.${verdict === 'good' ? 'good' : verdict === 'failed' ? 'failed' : 'unclear'}`)}
              {verdict !== 'failed' && result.value.polarity && ` (${result.value.polarity})`}
            </Big>
            <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">
              {result.value.said.map((x, i) => (
                <li key={`${x.code}-${i}`}>{saidIn(x, lang)}</li>
              ))}
            </ul>
          </>
        )}
      </Result>
      <Examples>
        <ExampleButton onClick={() => setR(GOOD_NPN)}>
          {t('bench.calc.example', { what: t('bench.calc.diode.goodNpn') })}
        </ExampleButton>
        <ExampleButton onClick={() => setR(SHORT_BC)}>{t('bench.calc.diode.shortBc')}</ExampleButton>
      </Examples>
    </>
  );
}
