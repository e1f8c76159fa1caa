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

// ——— diode test ———

const LEAD = { B: 'base', C: 'collector', E: 'emitter' } as const;
const EMPTY_READINGS: Record<ProbePair, string> = { BE: '', EB: '', BC: '', CB: '', CE: '', EC: '' };
const GOOD_NPN: Record<ProbePair, string> = { BE: '0.65', EB: 'OL', BC: '0.62', CB: 'OL', CE: 'OL', EC: 'OL' };
const SHORT_BC: Record<ProbePair, string> = { BE: '0.66', EB: 'OL', BC: '0.002', CB: '0.003', CE: '0.66', EC: 'OL' };

export function DiodeTest() {
  const [r, setR] = useState(EMPTY_READINGS);
  const parsed = PROBE_PAIRS.map((p) => [p, parseReading(r[p])] as const);
  const errors = Object.fromEntries(
    parsed.filter(([p, v]) => r[p].trim() !== '' && v === null).map(([p]) => [p, 'Volts, or OL.']),
  );
  const complete = parsed.every(([, v]) => v !== null);
  const result = complete ? attempt(() => interpretDiodeTest(Object.fromEntries(parsed) as DiodeReadings)) : null;
  const verdict = result?.ok ? result.value.verdict : null;
  return (
    <>
      <p className="text-sm text-ink-soft">
        Meter on the diode range, part out of circuit; B base, C collector, E emitter. Enter OL when the meter shows OL
        — also for the lone 1 some older meters show.
      </p>
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        {PROBE_PAIRS.map((p) => (
          <div key={p} className="flex items-start gap-2">
            <div className="flex-1">
              <TextField
                label={`Red on ${p[0]}, black on ${p[1]} (V)`}
                inputMode="decimal"
                autoComplete="off"
                value={r[p]}
                onChange={(e) => setR((x) => ({ ...x, [p]: e.target.value }))}
                error={errors[p]}
              />
            </div>
            <OlButton
              label={`Red on ${LEAD[p[0] as keyof typeof LEAD]}, black on ${LEAD[p[1] as keyof typeof LEAD]} reads OL`}
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
          <Prompt>Enter all six readings.</Prompt>
        ) : !result.ok ? (
          <p className="font-semibold">{result.error}</p>
        ) : (
          <>
            <Big>
              {verdict === 'good'
                ? `Good${result.value.polarity ? ` (${result.value.polarity})` : ''}`
                : verdict === 'failed'
                  ? 'Failed'
                  : `Unclear${result.value.polarity ? ` (${result.value.polarity})` : ''}`}
            </Big>
            <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">
              {result.value.reasons.map((x) => (
                <li key={x}>{x}</li>
              ))}
            </ul>
          </>
        )}
      </Result>
      <Examples>
        <ExampleButton onClick={() => setR(GOOD_NPN)}>Worked example: a good NPN</ExampleButton>
        <ExampleButton onClick={() => setR(SHORT_BC)}>Base–collector short</ExampleButton>
      </Examples>
    </>
  );
}
