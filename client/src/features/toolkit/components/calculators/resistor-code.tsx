import { useState } from 'react';
import { decodePrintedCode, formatOhms } from '../../../../../../shared/calculators/resistors';
import { TextField } from '../../../../components/ui/field';
import { attempt, Big, ExampleButton, Examples, Prompt, QuickFill, Result } from './ui';

// ——— printed codes ———

const CODE_EXAMPLES = ['103', '100', '472', '1002', '4R7', '1R0', 'R47', '4K7', '000'] as const;

export function ResistorCode() {
  const [code, setCode] = useState('');
  const result = code.trim() ? attempt(() => decodePrintedCode(code)) : null;
  return (
    <>
      <TextField
        label="Code printed on the part"
        value={code}
        onChange={(e) => setCode(e.target.value)}
        autoCapitalize="characters"
        autoComplete="off"
        spellCheck={false}
        className="block w-full rounded-lg border border-ink/20 bg-white px-3 py-2.5 font-mono text-xl tracking-widest text-ink shadow-sm outline-none focus:border-copper focus:ring-2 focus:ring-copper/30"
        hint="3 or 4 digits, R/K/M notation, optionally a tolerance letter (B C D F G J K M)."
      />
      <QuickFill label="Try:" values={CODE_EXAMPLES} onPick={setCode} />
      <Result id="resistor-code" tone={result && !result.ok ? 'bad' : 'neutral'}>
        {!result ? (
          <Prompt>Type a code to read it.</Prompt>
        ) : result.ok ? (
          <>
            <Big>{result.value.text}</Big>
            {result.value.minOhms !== null && result.value.maxOhms !== null && (
              <p className="text-sm">
                Between {formatOhms(result.value.minOhms)} and {formatOhms(result.value.maxOhms)}.
              </p>
            )}
            {result.value.tolerancePct === null && (
              <p className="text-sm">No tolerance letter: the code alone does not say the tolerance.</p>
            )}
            {result.value.notes.map((n) => (
              <p key={n} className="text-sm text-ink-soft">
                {n}
              </p>
            ))}
          </>
        ) : (
          <p className="font-semibold">{result.error}</p>
        )}
      </Result>
      <Examples>
        <ExampleButton onClick={() => setCode('4K7')}>Worked example: 4K7</ExampleButton>
      </Examples>
    </>
  );
}
