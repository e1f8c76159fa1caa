import { useState } from 'react';
import { decodePrintedCode } from '../../../../../../shared/calculators/resistors';
import { TextField } from '../../../../components/ui/field';
import { attempt, Big, ExampleButton, Examples, Prompt, QuickFill, Result, useFormats } from './ui';
import { useT } from '../../../../lib/i18n';
import { saidIn } from '../said';
import { decimalsIn } from '../numbers';

// ——— printed codes ———

const CODE_EXAMPLES = ['103', '100', '472', '1002', '4R7', '1R0', 'R47', '4K7', '000'] as const;

export function ResistorCode() {
  const t = useT();
  const { lang, ohms: formatOhms } = useFormats();
  const [code, setCode] = useState('');
  const result = code.trim() ? attempt(() => decodePrintedCode(code)) : null;
  return (
    <>
      <TextField
        label={t('bench.calc.code.label')}
        value={code}
        onChange={(e) => setCode(e.target.value)}
        autoCapitalize="characters"
        autoComplete="off"
        spellCheck={false}
        className="block w-full rounded-lg border border-ink/20 bg-white px-3 py-2.5 font-mono text-xl tracking-widest text-ink shadow-sm outline-none focus:border-copper focus:ring-2 focus:ring-copper/30"
        hint={t('bench.calc.code.hint')}
      />
      <QuickFill label={t('bench.calc.code.try')} values={CODE_EXAMPLES} onPick={setCode} />
      <Result id="resistor-code" tone={result && !result.ok ? 'bad' : 'neutral'}>
        {!result ? (
          <Prompt>{t('bench.calc.code.prompt')}</Prompt>
        ) : result.ok ? (
          <>
            <Big>{decimalsIn(result.value.text, lang)}</Big>
            {result.value.minOhms !== null && result.value.maxOhms !== null && (
              <p className="text-sm">
                {t('bench.calc.between', {
                  min: formatOhms(result.value.minOhms),
                  max: formatOhms(result.value.maxOhms),
                })}
              </p>
            )}
            {result.value.tolerancePct === null && <p className="text-sm">{t('bench.calc.code.noTolerance')}</p>}
            {result.value.notesSaid.map((n) => (
              <p key={n.code} className="text-sm text-ink-soft">
                {saidIn(n, lang)}
              </p>
            ))}
          </>
        ) : (
          <p className="font-semibold">{saidIn(result.error, lang)}</p>
        )}
      </Result>
      <Examples>
        <ExampleButton onClick={() => setCode('4K7')}>{t('bench.calc.example', { what: '4K7' })}</ExampleButton>
      </Examples>
    </>
  );
}
