import { useState } from 'react';
import { MAINS_MAX_V, MAINS_MIN_V, rectifiedPeak } from '../../../../../../shared/calculators/mains';
import { TextField } from '../../../../components/ui/field';
import { attempt, bad, Big, ExampleButton, Examples, num, Prompt, QuickFill, Result, useFormats } from './ui';
import { useT } from '../../../../lib/i18n';
import { saidIn } from '../said';

// ——— mains peak ———

export function MainsPeak() {
  const t = useT();
  const { lang, fmt } = useFormats();
  const [vrms, setVrms] = useState('');
  const v = num(vrms);
  const result = v !== undefined && !Number.isNaN(v) ? attempt(() => rectifiedPeak(v)) : null;
  return (
    <>
      <TextField
        label={t('bench.calc.mains.label')}
        inputMode="decimal"
        autoComplete="off"
        value={vrms}
        onChange={(e) => setVrms(e.target.value)}
        error={bad(vrms) ? t('bench.calc.mains.error') : undefined}
        hint={`${MAINS_MIN_V}–${MAINS_MAX_V} V (230 V + 10 %).`}
      />
      <QuickFill label={t('bench.calc.mains.common')} values={['120', '220', '230', '240']} onPick={setVrms} />
      <Result id="mains-peak" tone={result && !result.ok ? 'bad' : result ? 'caution' : 'neutral'}>
        {!result ? (
          <Prompt>{t('bench.calc.mains.prompt')}</Prompt>
        ) : result.ok ? (
          <>
            <Big>{t('bench.calc.mains.peak', { v: fmt(result.value.peakV) })}</Big>
            <p>
              {t('bench.calc.mains.detail', {
                vrms: fmt(result.value.vrms, 1),
                thumb: fmt(result.value.ruleOfThumbV, 2),
              })}
            </p>
            <p className="mt-1 text-sm">{t('bench.calc.mains.note')}</p>
          </>
        ) : (
          <p className="font-semibold">{saidIn(result.error, lang)}</p>
        )}
      </Result>
      <Examples>
        <ExampleButton onClick={() => setVrms('230')}>{t('bench.calc.example', { what: '230 V' })}</ExampleButton>
      </Examples>
    </>
  );
}
