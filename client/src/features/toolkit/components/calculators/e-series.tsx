import { useState } from 'react';
import { nearestStandard, type ESeriesName } from '../../../../../../shared/calculators/e-series';
import { parseOhms } from '../../../../../../shared/calculators/resistors';
import { TextField } from '../../../../components/ui/field';
import { attempt, Big, ExampleButton, Examples, ohmsError, ohmsHint, Prompt, Result, Tiles, useFormats } from './ui';
import { useT } from '../../../../lib/i18n';
import { saidIn } from '../said';

// ——— E-series ———

export function ESeries() {
  const t = useT();
  const { lang, fmt, ohms: formatOhms } = useFormats();
  const [value, setValue] = useState('');
  const [series, setSeries] = useState<ESeriesName>('E24');
  const ohms = parseOhms(value);
  const result = ohms !== undefined && !Number.isNaN(ohms) ? attempt(() => nearestStandard(ohms, series)) : null;
  return (
    <>
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label={t('bench.calc.eseries.value')}
          inputMode="decimal"
          autoComplete="off"
          value={value}
          onChange={(e) => setValue(e.target.value)}
          error={ohmsError(value)}
          hint={ohmsHint()}
        />
        <Tiles
          legend={t('bench.calc.eseries.series')}
          options={['E6', 'E12', 'E24'] as const}
          value={series}
          onChange={setSeries}
        />
      </div>
      <Result id="e-series" tone={result && !result.ok ? 'bad' : 'neutral'}>
        {!result ? (
          <Prompt>{t('bench.calc.eseries.prompt')}</Prompt>
        ) : result.ok ? (
          <>
            <Big>{formatOhms(result.value.nearest)}</Big>
            <p>
              {result.value.exact
                ? t('bench.calc.eseries.exact', { value: formatOhms(result.value.nearest), series })
                : t('bench.calc.eseries.nearest', {
                    series,
                    pct: `${result.value.errorPct > 0 ? '+' : ''}${fmt(result.value.errorPct, 1)}`,
                    below: formatOhms(result.value.below),
                    above: formatOhms(result.value.above),
                  })}
            </p>
          </>
        ) : (
          <p className="font-semibold">{saidIn(result.error, lang)}</p>
        )}
      </Result>
      <Examples>
        <ExampleButton
          onClick={() => {
            setValue('319');
            setSeries('E24');
          }}
        >
          {t('bench.calc.eseries.example')}
        </ExampleButton>
      </Examples>
    </>
  );
}
