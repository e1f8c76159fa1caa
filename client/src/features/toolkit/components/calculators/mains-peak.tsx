import { useState } from 'react';
import { MAINS_MAX_V, MAINS_MIN_V, rectifiedPeak } from '../../../../../../shared/calculators/mains';
import { TextField } from '../../../../components/ui/field';
import { attempt, bad, Big, ExampleButton, Examples, num, Prompt, QuickFill, Result, show } from './ui';

// ——— mains peak ———

export function MainsPeak() {
  const [vrms, setVrms] = useState('');
  const v = num(vrms);
  const result = v !== undefined && !Number.isNaN(v) ? attempt(() => rectifiedPeak(v)) : null;
  return (
    <>
      <TextField
        label="Mains voltage (V rms)"
        inputMode="decimal"
        autoComplete="off"
        value={vrms}
        onChange={(e) => setVrms(e.target.value)}
        error={bad(vrms) ? 'Enter a number of volts, e.g. 230.' : undefined}
        hint={`${MAINS_MIN_V}–${MAINS_MAX_V} V (230 V + 10 %).`}
      />
      <QuickFill label="Common:" values={['120', '220', '230', '240']} onPick={setVrms} />
      <Result id="mains-peak" tone={result && !result.ok ? 'bad' : result ? 'caution' : 'neutral'}>
        {!result ? (
          <Prompt>Enter the mains voltage.</Prompt>
        ) : result.ok ? (
          <>
            <Big>{show(result.value.peakV)} V DC</Big>
            <p>
              on the reservoir capacitor ({show(result.value.vrms, 1)} V × √2). Rule of thumb × 1.414:{' '}
              {show(result.value.ruleOfThumbV, 2)} V.
            </p>
            <p className="mt-1 text-sm">{result.value.note}</p>
          </>
        ) : (
          <p className="font-semibold">{result.error}</p>
        )}
      </Result>
      <Examples>
        <ExampleButton onClick={() => setVrms('230')}>Worked example: 230 V</ExampleButton>
      </Examples>
    </>
  );
}
