import { useState } from 'react';
import { nearestStandard, type ESeriesName } from '../../../../../../shared/calculators/e-series';
import { formatOhms, parseOhms } from '../../../../../../shared/calculators/resistors';
import { TextField } from '../../../../components/ui/field';
import { attempt, Big, ExampleButton, Examples, OHMS_HINT, ohmsError, Prompt, Result, show, Tiles } from './ui';

// ——— E-series ———

export function ESeries() {
  const [value, setValue] = useState('');
  const [series, setSeries] = useState<ESeriesName>('E24');
  const ohms = parseOhms(value);
  const result = ohms !== undefined && !Number.isNaN(ohms) ? attempt(() => nearestStandard(ohms, series)) : null;
  return (
    <>
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Value wanted (Ω)"
          inputMode="decimal"
          autoComplete="off"
          value={value}
          onChange={(e) => setValue(e.target.value)}
          error={ohmsError(value)}
          hint={OHMS_HINT}
        />
        <Tiles legend="Series" options={['E6', 'E12', 'E24'] as const} value={series} onChange={setSeries} />
      </div>
      <Result id="e-series" tone={result && !result.ok ? 'bad' : 'neutral'}>
        {!result ? (
          <Prompt>Enter a value to find the nearest standard one.</Prompt>
        ) : result.ok ? (
          <>
            <Big>{formatOhms(result.value.nearest)}</Big>
            <p>
              {result.value.exact
                ? `${formatOhms(result.value.nearest)} is itself an ${series} value.`
                : `Nearest ${series} value (${result.value.errorPct > 0 ? '+' : ''}${show(result.value.errorPct, 1)} %). Either side: ${formatOhms(result.value.below)} and ${formatOhms(result.value.above)}.`}
            </p>
          </>
        ) : (
          <p className="font-semibold">{result.error}</p>
        )}
      </Result>
      <Examples>
        <ExampleButton
          onClick={() => {
            setValue('319');
            setSeries('E24');
          }}
        >
          Worked example: 319 Ω in E24
        </ExampleButton>
      </Examples>
    </>
  );
}
