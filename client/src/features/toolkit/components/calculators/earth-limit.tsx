import { useState } from 'react';
import { cordResistanceLimitOhm, protectiveConductorLimitOhm } from '../../../../../../shared/safety/limits';
import { TextField } from '../../../../components/ui/field';
import { attempt, bad, Big, ExampleButton, Examples, num, Prompt, Result, useFormats } from './ui';
import { useT } from '../../../../lib/i18n';
import { saidIn } from '../said';
import { formatNumber } from '../numbers';

// ——— earth limit ———

export function EarthLimit() {
  const t = useT();
  const { lang } = useFormats();
  const f = (x: number) => formatNumber(x, lang, 6);
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
          label={t('bench.calc.earth.cord')}
          inputMode="decimal"
          autoComplete="off"
          value={cord}
          onChange={(e) => setCord(e.target.value)}
          error={bad(cord) ? t('bench.calc.earth.cordError') : undefined}
          hint={t('bench.calc.earth.cordHint')}
        />
        <TextField
          label={t('bench.calc.earth.reading')}
          inputMode="decimal"
          autoComplete="off"
          value={reading}
          onChange={(e) => setReading(e.target.value)}
          error={
            bad(reading) ? t('bench.calc.earth.readingError') : negative ? t('bench.calc.earth.negative') : undefined
          }
          hint={t('bench.calc.earth.readingHint')}
        />
      </div>
      <Result
        id="earth-limit"
        tone={!limit ? 'neutral' : !limit.ok || pass === false ? 'bad' : pass ? 'good' : 'neutral'}
      >
        {!limit ? (
          <Prompt>{t('bench.calc.earth.prompt')}</Prompt>
        ) : !limit.ok ? (
          <p className="font-semibold">{saidIn(limit.error, lang)}</p>
        ) : (
          <>
            <Big>{t('bench.calc.earth.atMost', { limit: f(limit.value) })}</Big>
            <p className="text-sm">{t('bench.calc.earth.detail', { m: f(m!), uk: f(cordResistanceLimitOhm(m!)) })}</p>
            {pass !== null && (
              <p className="mt-1 font-bold">
                {t(pass ? 'bench.calc.earth.passes' : 'bench.calc.earth.fails', { ohms: f(ohms!) })}
              </p>
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
          {t('bench.calc.earth.example')}
        </ExampleButton>
      </Examples>
    </>
  );
}
