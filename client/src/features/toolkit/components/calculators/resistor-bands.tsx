import { useState } from 'react';
import {
  decodeBands,
  DIGIT_COLOURS,
  MULTIPLIER_COLOURS,
  MULTIPLIER_EXPONENT,
  TOLERANCE_BY_COLOUR,
  TOLERANCE_COLOURS,
  type BandColour,
  type DigitColour,
  type MultiplierColour,
  type ToleranceColour,
} from '../../../../../../shared/calculators/resistors';
import { SelectField } from '../../../../components/ui/field';
import { attempt, Big, ExampleButton, Examples, Result, Tiles, useFormats } from './ui';
import { tr, useT } from '../../../../lib/i18n';
import { saidIn } from '../said';
import { decimalsIn } from '../numbers';

// ——— resistor colour bands ———

const SWATCH: Record<BandColour, string> = {
  black: '#111111',
  brown: '#7a4a1e',
  red: '#d32f2f',
  orange: '#f57c00',
  yellow: '#fbc02d',
  green: '#2e7d32',
  blue: '#1565c0',
  violet: '#7b1fa2',
  grey: '#8d8d8d',
  white: '#ffffff',
  gold: '#c9a227',
  silver: '#b8b8b8',
  none: 'transparent',
};
/** A colour's name in the reader's language (capitalised, as it starts an option). */
const cap = (c: string) => tr(`bench.calc.colour.${c}`);
const multiplierLabel = (c: MultiplierColour) => {
  const e = MULTIPLIER_EXPONENT[c];
  return e < 0 ? `×${10 ** e}` : `×${10 ** (e % 3)}${['', 'k', 'M', 'G'][Math.floor(e / 3)]}`;
};

function Swatch({ colour }: { colour: BandColour }) {
  return (
    <span
      aria-hidden
      className={`mb-1 size-11 shrink-0 rounded-lg ring-1 ring-ink/25 ${colour === 'none' ? 'border-2 border-dashed border-ink/30' : ''}`}
      style={{ background: SWATCH[colour] }}
    />
  );
}

function BandSelect({
  label,
  value,
  options,
  optionLabel,
  onChange,
}: {
  label: string;
  value: BandColour;
  options: readonly BandColour[];
  optionLabel: (c: BandColour) => string;
  onChange: (c: BandColour) => void;
}) {
  return (
    <div className="flex items-end gap-2">
      <Swatch colour={value} />
      <div className="flex-1">
        <SelectField label={label} value={value} onChange={(e) => onChange(e.target.value as BandColour)}>
          {options.map((c) => (
            <option key={c} value={c}>
              {optionLabel(c)}
            </option>
          ))}
        </SelectField>
      </div>
    </div>
  );
}

const FOUR_EXAMPLE: BandColour[] = ['yellow', 'violet', 'red', 'gold'];
const FIVE_EXAMPLE: BandColour[] = ['brown', 'black', 'black', 'gold', 'brown'];

export function ResistorBands() {
  const t = useT();
  const { lang, fmt, ohms: formatOhms } = useFormats();
  const [bands, setBands] = useState<BandColour[]>(['brown', 'black', 'red', 'gold']);
  const count = bands.length as 4 | 5;
  const setCount = (n: 4 | 5) => {
    if (n === count) return;
    // Keep what was chosen: add or drop the third digit.
    setBands(
      n === 5
        ? [bands[0], bands[1], 'black', bands[2], bands[3] === 'none' ? 'brown' : bands[3]]
        : [bands[0], bands[1], bands[3], bands[4]],
    );
  };
  const set = (i: number, c: BandColour) => setBands((b) => b.map((x, j) => (j === i ? c : x)));
  const digits = count - 2;
  const result = attempt(() => decodeBands(bands));
  const digitLabel = (c: BandColour) => `${cap(c)} — ${DIGIT_COLOURS.indexOf(c as DigitColour)}`;
  return (
    <>
      <Tiles
        legend={t('bench.calc.bands.count')}
        options={['4', '5'] as const}
        value={String(count) as '4' | '5'}
        onChange={(v) => setCount(Number(v) as 4 | 5)}
        label={(o) => t('bench.calc.bands.n', { n: o })}
      />
      <ResistorPicture bands={bands} />
      <div className="grid gap-3 sm:grid-cols-2">
        {Array.from({ length: digits }, (_, i) => (
          <BandSelect
            key={i}
            label={t(`bench.calc.bands.digit${i + 1}`, { n: i + 1 })}
            value={bands[i]}
            options={i === 0 ? DIGIT_COLOURS.filter((c) => c !== 'black') : DIGIT_COLOURS}
            optionLabel={digitLabel}
            onChange={(c) => set(i, c)}
          />
        ))}
        <BandSelect
          label={t('bench.calc.bands.multiplier', { n: digits + 1 })}
          value={bands[digits]}
          options={MULTIPLIER_COLOURS}
          optionLabel={(c) => `${cap(c)} — ${decimalsIn(multiplierLabel(c as MultiplierColour), lang)}`}
          onChange={(c) => set(digits, c)}
        />
        <BandSelect
          label={t('bench.calc.bands.tolerance', { n: digits + 2 })}
          value={bands[digits + 1]}
          options={count === 5 ? TOLERANCE_COLOURS.filter((c) => c !== 'none') : TOLERANCE_COLOURS}
          optionLabel={(c) =>
            c === 'none'
              ? t('bench.calc.bands.none')
              : `${cap(c)} — ±${fmt(TOLERANCE_BY_COLOUR[c as ToleranceColour])} %`
          }
          onChange={(c) => set(digits + 1, c)}
        />
      </div>
      <Result id="resistor-bands" tone={result.ok ? 'neutral' : 'bad'}>
        {result.ok ? (
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
          </>
        ) : (
          <p className="font-semibold">{saidIn(result.error, lang)}</p>
        )}
      </Result>
      <Examples>
        <ExampleButton onClick={() => setBands(FOUR_EXAMPLE)}>{t('bench.calc.bands.example4')}</ExampleButton>
        <ExampleButton onClick={() => setBands(FIVE_EXAMPLE)}>{t('bench.calc.bands.example5')}</ExampleButton>
      </Examples>
    </>
  );
}

function ResistorPicture({ bands }: { bands: BandColour[] }) {
  const value = bands.slice(0, -1);
  const tolerance = bands[bands.length - 1];
  return (
    <div aria-hidden className="relative flex h-14 items-center">
      <div className="absolute inset-x-0 top-1/2 h-1 -translate-y-1/2 rounded bg-ink/30" />
      <div className="relative mx-8 flex h-14 flex-1 items-stretch gap-2 rounded-3xl bg-[#e8d3a9] px-5 ring-1 ring-ink/20 sm:mx-16">
        {value.map((c, i) => (
          <span key={i} className="w-3 sm:w-4" style={{ background: SWATCH[c] }} />
        ))}
        <span className="ml-auto w-3 sm:w-4" style={{ background: SWATCH[tolerance] }} />
      </div>
    </div>
  );
}
