import { useState } from 'react';
import { cordResistanceLimitOhm, protectiveConductorLimitOhm } from '../../../../../../shared/safety/limits';
import { TextField } from '../../../../components/ui/field';
import { attempt, bad, Big, ExampleButton, Examples, num, Prompt, Result } from './ui';

// ——— earth limit ———

export function EarthLimit() {
  const [cord, setCord] = useState('');
  const [reading, setReading] = useState('');
  const m = num(cord);
  const ohms = num(reading);
  const limit = m !== undefined && !Number.isNaN(m) ? attempt(() => protectiveConductorLimitOhm(m)) : null;
  // A negative reading is a meter or lead fault, never a pass.
  const negative = ohms !== undefined && ohms < 0;
  const pass = limit?.ok && ohms !== undefined && !Number.isNaN(ohms) && !negative ? ohms <= limit.value : null;
  return (
    <>
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Cord length (m)"
          inputMode="decimal"
          autoComplete="off"
          value={cord}
          onChange={(e) => setCord(e.target.value)}
          error={bad(cord) ? 'Enter metres, e.g. 2.' : undefined}
          hint="0.3 Ω up to 5 m, +0.1 Ω per further 7.5 m begun, at most 1.0 Ω."
        />
        <TextField
          label="Reading (Ω, optional)"
          inputMode="decimal"
          autoComplete="off"
          value={reading}
          onChange={(e) => setReading(e.target.value)}
          error={
            bad(reading)
              ? 'Enter ohms, e.g. 0.12.'
              : negative
                ? 'A reading below 0 Ω means the leads were not nulled or the meter is faulty: null the leads and measure again.'
                : undefined
          }
          hint="Plug earth pin to the earthed metal."
        />
      </div>
      <Result
        id="earth-limit"
        tone={!limit ? 'neutral' : !limit.ok || pass === false ? 'bad' : pass ? 'good' : 'neutral'}
      >
        {!limit ? (
          <Prompt>Enter the cord length.</Prompt>
        ) : !limit.ok ? (
          <p className="font-semibold">{limit.error}</p>
        ) : (
          <>
            <Big>At most {limit.value} Ω</Big>
            <p className="text-sm">
              for {m} m of cord (EN 50678 / EN 50699). UK-style, 0.1 Ω plus a 1.0 mm² cord at 19.5 mΩ/m (from memory):{' '}
              {cordResistanceLimitOhm(m!)} Ω.
            </p>
            {pass !== null && (
              <p className="mt-1 font-bold">{pass ? `${ohms} Ω passes.` : `${ohms} Ω is above the limit: fails.`}</p>
            )}
          </>
        )}
      </Result>
      <Examples>
        <ExampleButton
          onClick={() => {
            setCord('12.5');
            setReading('0.25');
          }}
        >
          Worked example: 12.5 m of cord
        </ExampleButton>
      </Examples>
    </>
  );
}
