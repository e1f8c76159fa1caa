import { useEffect, useId, useState, type ReactNode } from 'react';
import { Link, useLocation, useSearchParams } from 'react-router';
import {
  DC_THRESHOLDS,
  DISCHARGE_SOURCE,
  dischargeAdvice,
  RESIDUAL_60V_5S,
  timeConstantS,
  timeToVoltage,
  voltageAfter,
  type SafeVoltageThreshold,
} from '../../../../shared/calculators/capacitors';
import { E_SERIES_SOURCE, nearestStandard, type ESeriesName } from '../../../../shared/calculators/e-series';
import { MAINS_MAX_V, MAINS_MIN_V, MAINS_PEAK_SOURCE, rectifiedPeak } from '../../../../shared/calculators/mains';
import { judgeResistance, MEASURE_SOURCE, parseReading, type MeasureVerdict } from '../../../../shared/calculators/measure';
import {
  decodeBands,
  decodePrintedCode,
  DIGIT_COLOURS,
  formatOhms,
  parseOhms,
  MULTIPLIER_COLOURS,
  MULTIPLIER_EXPONENT,
  RESISTOR_CODE_SOURCE,
  TOLERANCE_BY_COLOUR,
  TOLERANCE_COLOURS,
  type BandColour,
  type DigitColour,
  type MultiplierColour,
  type ToleranceColour,
} from '../../../../shared/calculators/resistors';
import {
  checkSubstitution,
  interpretDiodeTest,
  PACKAGES,
  PROBE_PAIRS,
  TRANSISTOR_SOURCE,
  TRANSISTOR_TYPES,
  type DiodeReadings,
  type ProbePair,
  type TransistorSpec,
  type TransistorType,
} from '../../../../shared/calculators/transistors';
import { CAUTIONS, LOCAL_RULES_PREVAIL } from '../../../../shared/safety/cautions';
import { cordResistanceLimitOhm, protectiveConductorLimitOhm, SAFETY_SOURCE } from '../../../../shared/safety/limits';
import { Button } from '../../components/ui/button';
import { Card, PageTitle } from '../../components/ui/feedback';
import { SelectField, TextField } from '../../components/ui/field';
import { paths } from '../../config/paths';

export type CalculatorId =
  | 'resistor-bands'
  | 'resistor-code'
  | 'e-series'
  | 'mains-peak'
  | 'discharge'
  | 'measure'
  | 'transistor'
  | 'diode-test'
  | 'earth-limit';

interface CalculatorMeta {
  title: string;
  summary: string;
  source: string;
  cautions: string[];
}

const ORDER: CalculatorId[] = [
  'resistor-bands',
  'resistor-code',
  'e-series',
  'mains-peak',
  'discharge',
  'measure',
  'transistor',
  'diode-test',
  'earth-limit',
];

const META: Record<CalculatorId, CalculatorMeta> = {
  'resistor-bands': {
    title: 'Resistor colour bands',
    summary: '4 or 5 bands to a value and tolerance.',
    source: RESISTOR_CODE_SOURCE,
    cautions: [
      'Read the colours in daylight: brown, red and orange look alike under warm light, and heat darkens them. Confirm with a meter, out of circuit.',
    ],
  },
  'resistor-code': {
    title: 'Printed resistor codes',
    summary: '103, 1002, 4R7, 4K7 and tolerance letters.',
    source: RESISTOR_CODE_SOURCE,
    cautions: ['A burnt resistor usually failed for a reason: find the cause before fitting a new one.'],
  },
  'e-series': {
    title: 'Nearest standard value',
    summary: 'The closest E6, E12 or E24 value, and the ones either side.',
    source: `${E_SERIES_SOURCE}; "nearest" by ratio (derived)`,
    cautions: [
      'Match the power rating and the kind of resistor too: a fusible or flameproof resistor in a mains supply is replaced by the same kind, never a plain one.',
    ],
  },
  'mains-peak': {
    title: 'Rectified mains peak',
    summary: 'The DC on the reservoir capacitor: Vrms × √2.',
    source: MAINS_PEAK_SOURCE,
    cautions: [CAUTIONS.capacitors.text, LOCAL_RULES_PREVAIL],
  },
  discharge: {
    title: 'Capacitor discharge',
    summary: 'Safe to touch yet? How long through a resistor?',
    source: `${DISCHARGE_SOURCE}. Thresholds: IEC 61140 (extra-low voltage), IEC 60204-1 6.2.4 and IEC 60335-1 22.5 (secondary sources)`,
    cautions: [
      CAUTIONS.capacitors.text,
      'Never short the terminals with a screwdriver. Microwave-oven capacitors stay outside what groups open.',
      LOCAL_RULES_PREVAIL,
    ],
  },
  measure: {
    title: 'Measured resistance',
    summary: 'Subtract the leads; within tolerance or not.',
    source: MEASURE_SOURCE,
    cautions: [
      'Measure with the item unplugged and its capacitors discharged. In circuit, parts in parallel make a resistor read low: lift one leg to be sure.',
    ],
  },
  transistor: {
    title: 'Transistor substitute',
    summary: 'Can this part replace the original?',
    source: TRANSISTOR_SOURCE,
    cautions: [
      'A failed power transistor often takes its driver, snubber or fuse with it: check the parts around it before powering up, ideally through a bulb or a variac.',
      LOCAL_RULES_PREVAIL,
    ],
  },
  'diode-test': {
    title: 'Transistor diode test',
    summary: 'Six readings to good, failed or unclear.',
    source: TRANSISTOR_SOURCE,
    cautions: ['Test out of circuit with the item unplugged: the parts around a transistor change the readings.'],
  },
  'earth-limit': {
    title: 'Earth limit for the cord',
    summary: 'Protective conductor resistance limit from cord length.',
    source: `${SAFETY_SOURCE}; UK-style limit from the IET Code of Practice, from memory`,
    cautions: [LOCAL_RULES_PREVAIL],
  },
};

const isCalculatorId = (s: string | null | undefined): s is CalculatorId =>
  Boolean(s) && (ORDER as string[]).includes(s!);

/** /toolkit/calculators: every bench calculator as a card; ?open=<id> or #<id> opens one and scrolls to it. */
export function CalculatorsPage() {
  const [params] = useSearchParams();
  const { hash, key } = useLocation();
  const fromHash = decodeURIComponent(hash.slice(1));
  // The hash wins: a chip link changes the hash even if an old ?open= stays in the address.
  const target = [fromHash, params.get('open')].find(isCalculatorId) ?? null;
  const [open, setOpen] = useState<Set<CalculatorId>>(() => new Set(target ? [target] : []));

  // Each navigation (a chip, a link from an item page) opens its calculator and brings it into view.
  useEffect(() => {
    if (!target) return;
    setOpen((s) => (s.has(target) ? s : new Set(s).add(target)));
    const frame = requestAnimationFrame(() => {
      const el = document.getElementById(target);
      el?.scrollIntoView({ block: 'start' });
      el?.querySelector<HTMLButtonElement>('[aria-expanded]')?.focus({ preventScroll: true });
    });
    return () => cancelAnimationFrame(frame);
  }, [target, key]);

  const toggle = (id: CalculatorId) =>
    setOpen((s) => {
      const next = new Set(s);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });

  return (
    <div className="mx-auto max-w-3xl">
      <PageTitle
        title="Bench calculators"
        lead={
          <>
            Quick sums for the bench, each with its source. They help judgement, they do not replace it:{' '}
            <Link to={paths.safety()} className="underline">
              safety at the bench
            </Link>
            .
          </>
        }
      />
      <nav aria-label="Calculators" className="mb-5">
        {/* One scrolling row on a phone, so the cards start on the first screen. */}
        <ul className="-mx-4 flex gap-2 overflow-x-auto px-4 pb-2 sm:mx-0 sm:flex-wrap sm:overflow-visible sm:px-0">
          {ORDER.map((id) => (
            <li key={id} className="shrink-0">
              <Link
                to={{ hash: id }}
                className="inline-flex min-h-11 items-center rounded-lg bg-white px-3 text-sm font-semibold text-navy ring-1 ring-navy/25 hover:bg-navy/5"
              >
                {META[id].title}
              </Link>
            </li>
          ))}
        </ul>
      </nav>
      <div className="space-y-3">
        {ORDER.map((id) => {
          const isOpen = open.has(id);
          return (
            <div key={id} id={id} data-testid={`calc-${id}`} className="scroll-mt-4">
              <Card flush>
                <h2 className="text-lg">
                  <button
                    type="button"
                    aria-expanded={isOpen}
                    aria-controls={`${id}-body`}
                    onClick={() => toggle(id)}
                    className="flex min-h-14 w-full items-center justify-between gap-3 rounded-xl px-5 py-3 text-left"
                  >
                    <span>
                      <span className="block">{META[id].title}</span>
                      <span className="block text-sm font-normal text-ink-soft">{META[id].summary}</span>
                    </span>
                    <span
                      aria-hidden
                      className={`text-2xl text-copper transition-transform ${isOpen ? 'rotate-90' : ''}`}
                    >
                      ›
                    </span>
                  </button>
                </h2>
                <div id={`${id}-body`} hidden={!isOpen} className="border-t border-ink/10 px-5 pb-5 pt-4">
                  <CalculatorBody id={id} />
                </div>
              </Card>
            </div>
          );
        })}
      </div>
    </div>
  );
}

/**
 * One calculator, for embedding (e.g. on an item's page); compact drops the summary and tightens the spacing.
 * `id` is optional in the type only because the router types every export of a lazy route module as a component
 * without props; without a known id it renders nothing.
 */
export function CalculatorPanel({ id, compact = false }: { id?: CalculatorId; compact?: boolean }) {
  if (!isCalculatorId(id)) return null;
  const meta = META[id];
  return (
    <div data-testid={`calc-${id}`}>
      <Card flush>
        <div className={compact ? 'p-3' : 'p-5'}>
          <h2 className={compact ? 'text-base' : 'text-lg'}>{meta.title}</h2>
          {!compact && <p className="mb-3 text-sm text-ink-soft">{meta.summary}</p>}
          <div className={compact ? 'mt-2' : ''}>
            <CalculatorBody id={id} compact={compact} />
          </div>
        </div>
      </Card>
    </div>
  );
}

function CalculatorBody({ id, compact = false }: { id: CalculatorId; compact?: boolean }) {
  const meta = META[id];
  const Body = BODIES[id];
  return (
    <div className={compact ? 'space-y-3' : 'space-y-4'}>
      <Body />
      <div className="rounded-lg border-l-4 border-copper bg-copper-light px-3 py-2 text-sm" role="note">
        <p className="font-bold">Cautions</p>
        <ul className="mt-1 list-disc space-y-1 pl-5">
          {meta.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </div>
      <p className="text-xs text-ink-soft">Source: {meta.source}.</p>
    </div>
  );
}

// ——— small pieces shared by the calculators ———

type Attempt<T> = { ok: true; value: T } | { ok: false; error: string };
/** The shared calculators throw RangeError with a message meant for the fixer; show it rather than crash. */
function attempt<T>(fn: () => T): Attempt<T> {
  try {
    return { ok: true, value: fn() };
  } catch (e) {
    return { ok: false, error: e instanceof Error ? e.message : String(e) };
  }
}

/** undefined when empty, NaN when not a number; a comma decimal is accepted. */
const num = (s: string) => (s.trim() === '' ? undefined : Number(s.trim().replace(',', '.')));
const bad = (s: string) => Number.isNaN(num(s) as number);
const show = (x: number, dp = 3) => String(Number(x.toFixed(dp)));

const OHMS_HINT = 'e.g. 330, 4.7k, 4k7, 2M2';
const ohmsError = (s: string) =>
  Number.isNaN(parseOhms(s) as number) ? 'Enter ohms, e.g. 330, 4.7k or 4k7 (M for megohms).' : undefined;

type Tone = 'neutral' | 'good' | 'bad' | 'caution';
const TONES: Record<Tone, string> = {
  neutral: 'bg-ink/5',
  good: 'bg-sage-light',
  bad: 'bg-alert-light text-alert',
  caution: 'bg-copper-light',
};

function Result({ id, tone = 'neutral', children }: { id: CalculatorId; tone?: Tone; children: ReactNode }) {
  return (
    <div data-testid={`result-${id}`} aria-live="polite" className={`rounded-lg px-4 py-3 ${TONES[tone]}`}>
      {children}
    </div>
  );
}

const Prompt = ({ children }: { children: ReactNode }) => <p className="text-ink-soft">{children}</p>;
const Big = ({ children }: { children: ReactNode }) => <p className="text-2xl font-extrabold text-navy">{children}</p>;

function Examples({ children }: { children: ReactNode }) {
  return <div className="flex flex-wrap gap-2">{children}</div>;
}
function ExampleButton({ onClick, children }: { onClick: () => void; children: ReactNode }) {
  return (
    <Button type="button" variant="secondary" onClick={onClick}>
      {children}
    </Button>
  );
}

/** Tiles that are radio buttons, as on the item page: the focus ring shows on the tile. */
const TILE_FOCUS = 'has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-copper has-[:focus-visible]:ring-offset-2';
function Tiles<T extends string>({
  legend,
  options,
  value,
  onChange,
  label = (o) => o,
}: {
  legend: string;
  options: readonly T[];
  value: T;
  onChange: (v: T) => void;
  label?: (o: T) => string;
}) {
  const name = useId();
  return (
    <fieldset>
      <legend className="font-semibold">{legend}</legend>
      <div role="radiogroup" className="mt-1 flex gap-2">
        {options.map((o) => (
          <label
            key={o}
            className={`flex min-h-11 flex-1 cursor-pointer items-center justify-center rounded-lg px-2 text-center font-semibold ring-1 ${TILE_FOCUS} ${value === o ? 'bg-navy text-white ring-navy' : 'bg-white ring-ink/20'}`}
          >
            <input type="radio" name={name} className="sr-only" checked={value === o} onChange={() => onChange(o)} />
            {label(o)}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

/** Sits beside a field, level with its input: the label above it is one line (1.5rem) plus the 0.25rem gap. */
function OlButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <Button type="button" variant="secondary" className="mt-7" onClick={onClick} aria-label={label}>
      OL
    </Button>
  );
}

function QuickFill({
  label,
  values,
  onPick,
}: {
  label: string;
  values: readonly string[];
  onPick: (v: string) => void;
}) {
  return (
    <div className="flex flex-wrap items-center gap-2">
      <span className="text-sm text-ink-soft">{label}</span>
      {values.map((v) => (
        <button
          key={v}
          type="button"
          onClick={() => onPick(v)}
          className="min-h-11 min-w-11 rounded-lg bg-white px-3 font-mono font-semibold text-navy ring-1 ring-navy/25 hover:bg-navy/5"
        >
          {v}
        </button>
      ))}
    </div>
  );
}

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
const cap = (s: string) => s[0].toUpperCase() + s.slice(1);
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

function ResistorBands() {
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
  const ordinal = ['First', 'Second', 'Third'];
  return (
    <>
      <Tiles
        legend="Number of bands"
        options={['4', '5'] as const}
        value={String(count) as '4' | '5'}
        onChange={(v) => setCount(Number(v) as 4 | 5)}
        label={(o) => `${o} bands`}
      />
      <ResistorPicture bands={bands} />
      <div className="grid gap-3 sm:grid-cols-2">
        {Array.from({ length: digits }, (_, i) => (
          <BandSelect
            key={i}
            label={`Band ${i + 1}: ${ordinal[i].toLowerCase()} digit`}
            value={bands[i]}
            options={i === 0 ? DIGIT_COLOURS.filter((c) => c !== 'black') : DIGIT_COLOURS}
            optionLabel={digitLabel}
            onChange={(c) => set(i, c)}
          />
        ))}
        <BandSelect
          label={`Band ${digits + 1}: multiplier`}
          value={bands[digits]}
          options={MULTIPLIER_COLOURS}
          optionLabel={(c) => `${cap(c)} — ${multiplierLabel(c as MultiplierColour)}`}
          onChange={(c) => set(digits, c)}
        />
        <BandSelect
          label={`Band ${digits + 2}: tolerance`}
          value={bands[digits + 1]}
          options={count === 5 ? TOLERANCE_COLOURS.filter((c) => c !== 'none') : TOLERANCE_COLOURS}
          optionLabel={(c) =>
            c === 'none' ? 'No band — ±20 %' : `${cap(c)} — ±${TOLERANCE_BY_COLOUR[c as ToleranceColour]} %`
          }
          onChange={(c) => set(digits + 1, c)}
        />
      </div>
      <Result id="resistor-bands" tone={result.ok ? 'neutral' : 'bad'}>
        {result.ok ? (
          <>
            <Big>{result.value.text}</Big>
            {result.value.minOhms !== null && result.value.maxOhms !== null && (
              <p className="text-sm">
                Between {formatOhms(result.value.minOhms)} and {formatOhms(result.value.maxOhms)}.
              </p>
            )}
          </>
        ) : (
          <p className="font-semibold">{result.error}</p>
        )}
      </Result>
      <Examples>
        <ExampleButton onClick={() => setBands(FOUR_EXAMPLE)}>Worked example: yellow-violet-red-gold</ExampleButton>
        <ExampleButton onClick={() => setBands(FIVE_EXAMPLE)}>5 bands: brown-black-black-gold-brown</ExampleButton>
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

// ——— printed codes ———

const CODE_EXAMPLES = ['103', '100', '472', '1002', '4R7', '1R0', 'R47', '4K7', '000'] as const;

function ResistorCode() {
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

// ——— E-series ———

function ESeries() {
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

// ——— mains peak ———

function MainsPeak() {
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

// ——— capacitor discharge ———

function Discharge() {
  const [f, setF] = useState({ uF: '', volts: '', ohms: '', seconds: '' });
  const [thresholdId, setThresholdId] = useState<SafeVoltageThreshold['id']>('plug-pins-34v');
  const threshold = DC_THRESHOLDS.find((t) => t.id === thresholdId) ?? DC_THRESHOLDS[DC_THRESHOLDS.length - 1];
  const uF = num(f.uF);
  const volts = num(f.volts);
  const ohms = parseOhms(f.ohms);
  const seconds = num(f.seconds);
  const invalid = [uF, volts, ohms, seconds].some((x) => Number.isNaN(x as number));
  const ready = uF !== undefined && volts !== undefined && !invalid;
  const c = (uF ?? 0) * 1e-6;
  const advice = ready
    ? attempt(() => dischargeAdvice({ voltageV: volts!, capacitanceF: c, resistanceOhm: ohms, threshold }))
    : null;
  const residual =
    ready && ohms !== undefined && seconds !== undefined ? attempt(() => voltageAfter(volts!, ohms, c, seconds)) : null;
  const field = (key: keyof typeof f, label: string, hint: string, ohmsField = false) => (
    <TextField
      label={label}
      inputMode="decimal"
      autoComplete="off"
      value={f[key]}
      onChange={(e) => setF((x) => ({ ...x, [key]: e.target.value }))}
      error={ohmsField ? ohmsError(f[key]) : bad(f[key]) ? 'Enter a number.' : undefined}
      hint={hint}
    />
  );
  return (
    <>
      <div className="grid gap-3 sm:grid-cols-2">
        {field('uF', 'Capacitance (µF)', 'Printed on the can, e.g. 100.')}
        {field('volts', 'Voltage on it now (V)', 'Measured, or the mains peak: 325 V for 230 V.')}
        {field('ohms', 'Discharge resistor (Ω, optional)', OHMS_HINT, true)}
        {field('seconds', 'After how long? (s, optional)', 'Gives the voltage left after this time.')}
      </div>
      <SelectField
        label="Threshold"
        value={thresholdId}
        onChange={(e) => setThresholdId(e.target.value as SafeVoltageThreshold['id'])}
        hint={threshold.source}
      >
        {DC_THRESHOLDS.map((t) => (
          <option key={t.id} value={t.id}>
            {t.volts} V — {t.label}
          </option>
        ))}
      </SelectField>
      <Result
        id="discharge"
        tone={!advice ? 'neutral' : !advice.ok ? 'bad' : advice.value.safeToTouch ? 'good' : 'bad'}
      >
        {!advice ? (
          <Prompt>
            {invalid
              ? 'A field is not a number; correct it to see the result.'
              : 'Enter the capacitance and the voltage.'}
          </Prompt>
        ) : !advice.ok ? (
          <p className="font-semibold">{advice.error}</p>
        ) : (
          <div className="space-y-2 text-ink">
            <p className={`text-xl font-extrabold ${advice.value.safeToTouch ? 'text-navy' : 'text-alert'}`}>
              {advice.value.safeToTouch
                ? `At or below ${threshold.volts} V — measure again before touching`
                : `Not safe to touch: above ${threshold.volts} V`}
            </p>
            <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm [&>dd]:whitespace-nowrap [&>dd]:text-right">
              <dt className="text-ink-soft">Stored energy</dt>
              <dd className="font-semibold">{show(advice.value.energyJ, 2)} J</dd>
              {ohms !== undefined && ohms > 0 && (
                <>
                  <dt className="text-ink-soft">Time constant τ = RC</dt>
                  <dd className="font-semibold">{show(timeConstantS(ohms, c), 4)} s</dd>
                </>
              )}
              {advice.value.waitS !== null && (
                <>
                  <dt className="text-ink-soft">Wait to {threshold.volts} V</dt>
                  <dd className="font-semibold">{show(advice.value.waitS, 4)} s</dd>
                </>
              )}
              {advice.value.fiveTauS !== null && (
                <>
                  <dt className="text-ink-soft">5τ (under 1 % left)</dt>
                  <dd className="font-semibold">
                    {show(advice.value.fiveTauS, 4)} s →{' '}
                    {show(voltageAfter(volts!, ohms!, c, advice.value.fiveTauS), 3)} V
                  </dd>
                </>
              )}
              {residual?.ok && (
                <>
                  <dt className="text-ink-soft">Left after {seconds} s</dt>
                  <dd className="font-semibold">{show(residual.value, 3)} V</dd>
                </>
              )}
              <dt className="text-ink-soft">
                Largest R for {threshold.volts} V within {advice.value.maxOhmWithinS} s
              </dt>
              <dd className="font-semibold">
                {Number.isFinite(advice.value.maxOhm) ? `${show(advice.value.maxOhm, 1)} Ω` : 'any'}
              </dd>
              {ohms !== undefined &&
                ohms > 0 &&
                otherThresholds(threshold, volts!).map((t) => (
                  <FragmentRow
                    key={t.id}
                    label={`Time to ${t.volts} V (${t.source.split(',')[0]})`}
                    value={`${show(timeToVoltage(volts!, t.volts, ohms, c), 4)} s`}
                  />
                ))}
            </dl>
            <ul className="list-disc space-y-1 pl-5 text-sm">
              {advice.value.messages.map((m) => (
                <li key={m}>{m}</li>
              ))}
            </ul>
          </div>
        )}
      </Result>
      <Examples>
        <ExampleButton
          onClick={() => {
            setF({ uF: '100', volts: '325.269', ohms: '10k', seconds: '5' });
            setThresholdId('plug-pins-34v');
          }}
        >
          Worked example: 100 µF, 325 V, 10 kΩ
        </ExampleButton>
        <ExampleButton
          onClick={() => {
            setF({ uF: '470', volts: '325.269', ohms: '', seconds: '' });
            setThresholdId(RESIDUAL_60V_5S.id);
          }}
        >
          470 µF to 60 V within 5 s
        </ExampleButton>
      </Examples>
    </>
  );
}

/** The other thresholds below the present voltage, one per voltage (IEC 60204-1 gives 60 V twice). */
const otherThresholds = (chosen: SafeVoltageThreshold, volts: number) =>
  DC_THRESHOLDS.filter(
    (t, i) => t.volts < volts && t.volts !== chosen.volts && DC_THRESHOLDS.findIndex((u) => u.volts === t.volts) === i,
  );

function FragmentRow({ label, value }: { label: string; value: string }) {
  return (
    <>
      <dt className="text-ink-soft">{label}</dt>
      <dd className="font-semibold">{value}</dd>
    </>
  );
}

// ——— measured resistance ———

const TOLERANCES = [...new Set(Object.values(TOLERANCE_BY_COLOUR))].sort((a, b) => a - b);
const VERDICT_TEXT: Record<MeasureVerdict, string> = {
  within: 'Within tolerance',
  'within-uncertainty': 'In the right range',
  outside: 'Outside tolerance',
  open: 'Open circuit',
};

function Measure() {
  const [f, setF] = useState({ reading: '', leads: '', nominal: '', tolerance: '5', uncertainty: '' });
  const reading = parseReading(f.reading);
  const leads = num(f.leads);
  const nominal = parseOhms(f.nominal);
  const uncertainty = num(f.uncertainty);
  const readingError =
    f.reading.trim() !== '' && reading === null ? 'Enter ohms, or OL when the meter shows OL.' : undefined;
  const invalid = Boolean(readingError) || [leads, nominal, uncertainty].some((x) => Number.isNaN(x as number));
  const result =
    reading !== null && nominal !== undefined && !invalid
      ? attempt(() =>
          judgeResistance({
            reading,
            leadsOhm: leads,
            nominalOhm: nominal,
            tolerancePct: Number(f.tolerance),
            uncertaintyOhm: uncertainty,
          }),
        )
      : null;
  const set = (key: keyof typeof f) => (e: { target: { value: string } }) =>
    setF((x) => ({ ...x, [key]: e.target.value }));
  const tone: Tone = !result
    ? 'neutral'
    : !result.ok
      ? 'bad'
      : result.value.verdict === 'within'
        ? 'good'
        : result.value.verdict === 'within-uncertainty'
          ? 'caution'
          : 'bad';
  return (
    <>
      <div className="grid gap-3 sm:grid-cols-2">
        <div className="flex items-start gap-2">
          <div className="flex-1">
            <TextField
              label="Meter reads (Ω or OL)"
              inputMode="decimal"
              autoComplete="off"
              value={f.reading}
              onChange={set('reading')}
              error={readingError}
            />
          </div>
          <OlButton label="Meter reads OL" onClick={() => setF((x) => ({ ...x, reading: 'OL' }))} />
        </div>
        <TextField
          label="Leads shorted read (Ω)"
          inputMode="decimal"
          autoComplete="off"
          value={f.leads}
          onChange={set('leads')}
          error={bad(f.leads) ? 'Enter a number, e.g. 0.1.' : undefined}
          hint="Touch the probes together first; often about 0.1 Ω."
        />
        <TextField
          label="Nominal value (Ω)"
          inputMode="decimal"
          autoComplete="off"
          value={f.nominal}
          onChange={set('nominal')}
          error={ohmsError(f.nominal)}
          hint={OHMS_HINT}
        />
        <SelectField label="Part tolerance" value={f.tolerance} onChange={set('tolerance')}>
          {TOLERANCES.map((t) => (
            <option key={t} value={t}>
              ±{t} %
            </option>
          ))}
        </SelectField>
        <TextField
          label="Meter uncertainty (Ω, optional)"
          inputMode="decimal"
          autoComplete="off"
          value={f.uncertainty}
          onChange={set('uncertainty')}
          error={bad(f.uncertainty) ? 'Enter a number, e.g. 0.1.' : undefined}
          hint="At least the last digit on this range; twice that once the leads are subtracted."
        />
      </div>
      <Result id="measure" tone={tone}>
        {!result ? (
          <Prompt>
            {invalid
              ? 'A field is not a number; correct it to see the result.'
              : 'Enter the reading and the nominal value.'}
          </Prompt>
        ) : !result.ok ? (
          <p className="font-semibold">{result.error}</p>
        ) : (
          <>
            <Big>{VERDICT_TEXT[result.value.verdict]}</Big>
            {result.value.netOhm !== null && (
              <p>
                Net {formatOhms(result.value.netOhm)} ({result.value.deviationPct! > 0 ? '+' : ''}
                {result.value.deviationPct} %); tolerance band {formatOhms(result.value.minOhm)}–
                {formatOhms(result.value.maxOhm)}.
              </p>
            )}
            <p className="mt-1 text-sm">{result.value.message}</p>
          </>
        )}
      </Result>
      <Examples>
        <ExampleButton
          onClick={() => setF({ reading: '1.2', leads: '0.1', nominal: '1', tolerance: '5', uncertainty: '0.1' })}
        >
          Worked example: 1 Ω reading 1.2 Ω
        </ExampleButton>
      </Examples>
    </>
  );
}

// ——— transistor substitute ———

interface SpecDraft {
  type: TransistorType;
  v: string;
  i: string;
  p: string;
  pkg: string;
  pinout: string;
  hfe: string;
  ft: string;
  vgs: string;
}
const EMPTY_SPEC: SpecDraft = { type: 'NPN', v: '', i: '', p: '', pkg: '', pinout: '', hfe: '', ft: '', vgs: '' };
const isBipolar = (t: TransistorType) => t === 'NPN' || t === 'PNP';

/** A spec from the form, or null while a required field is empty or a field is not a number. */
function toSpec(d: SpecDraft): TransistorSpec | null {
  const required = [num(d.v), num(d.i), num(d.p)];
  const optional = [num(d.hfe), num(d.ft), num(d.vgs)];
  if (
    required.some((x) => x === undefined || Number.isNaN(x)) ||
    optional.some((x) => Number.isNaN(x as number)) ||
    !d.pkg.trim()
  )
    return null;
  const bipolar = isBipolar(d.type);
  return {
    type: d.type,
    vMaxV: required[0]!,
    iMaxA: required[1]!,
    ptotW: required[2]!,
    package: d.pkg,
    pinout: d.pinout.trim() || undefined,
    hfeMin: bipolar ? optional[0] : undefined,
    ftMHz: bipolar ? optional[1] : undefined,
    vgsThMaxV: bipolar ? undefined : optional[2],
  };
}

function SpecFields({
  legend,
  draft,
  onChange,
  packagesId,
}: {
  legend: string;
  draft: SpecDraft;
  onChange: (d: SpecDraft) => void;
  packagesId: string;
}) {
  const bipolar = isBipolar(draft.type);
  const text = (key: Exclude<keyof SpecDraft, 'type'>, label: string, hint?: string, decimal = true) => (
    <TextField
      label={label}
      inputMode={decimal ? 'decimal' : undefined}
      autoComplete="off"
      value={draft[key]}
      onChange={(e) => onChange({ ...draft, [key]: e.target.value })}
      error={decimal && bad(draft[key]) ? 'Enter a number.' : undefined}
      hint={hint}
    />
  );
  return (
    <fieldset className="space-y-3 rounded-lg p-3 ring-1 ring-ink/10">
      <legend className="px-1 font-bold">{legend}</legend>
      <SelectField
        label="Type"
        value={draft.type}
        onChange={(e) => onChange({ ...draft, type: e.target.value as TransistorType })}
      >
        {TRANSISTOR_TYPES.map((t) => (
          <option key={t} value={t}>
            {t}
          </option>
        ))}
      </SelectField>
      <div className="grid grid-cols-3 gap-2">
        {text('v', bipolar ? 'Vceo (V)' : 'Vds (V)')}
        {text('i', bipolar ? 'Ic (A)' : 'Id (A)')}
        {text('p', 'Ptot (W)')}
      </div>
      <div className="grid grid-cols-2 gap-2">
        <TextField
          label="Package"
          list={packagesId}
          autoComplete="off"
          value={draft.pkg}
          onChange={(e) => onChange({ ...draft, pkg: e.target.value })}
          placeholder="TO-220"
        />
        <TextField
          label="Pin-out"
          autoCapitalize="characters"
          autoComplete="off"
          value={draft.pinout}
          onChange={(e) => onChange({ ...draft, pinout: e.target.value })}
          placeholder={bipolar ? 'BCE' : 'GDS'}
        />
      </div>
      <div className="grid grid-cols-2 gap-2">
        {bipolar ? (
          <>
            {text('hfe', 'Gain hFE (optional)')}
            {text('ft', 'fT, MHz (optional)')}
          </>
        ) : (
          text('vgs', 'Vgs(th) max, V (optional)')
        )}
      </div>
    </fieldset>
  );
}

const REF_ORIGINAL: SpecDraft = { ...EMPTY_SPEC, v: '400', i: '4', p: '75', pkg: 'TO-220', pinout: 'BCE' };
const REF_CANDIDATE: SpecDraft = { ...EMPTY_SPEC, v: '450', i: '5', p: '80', pkg: 'TO-220', pinout: 'BCE' };

function Transistor() {
  const [original, setOriginal] = useState<SpecDraft>(EMPTY_SPEC);
  const [candidate, setCandidate] = useState<SpecDraft>(EMPTY_SPEC);
  const packagesId = useId();
  const o = toSpec(original);
  const c = toSpec(candidate);
  const result = o && c ? attempt(() => checkSubstitution(o, c)) : null;
  const verdict = result?.ok ? result.value.verdict : null;
  return (
    <>
      <datalist id={packagesId}>
        {Object.keys(PACKAGES).map((p) => (
          <option key={p} value={p} />
        ))}
      </datalist>
      <div className="grid gap-3 sm:grid-cols-2">
        <SpecFields legend="Original" draft={original} onChange={setOriginal} packagesId={packagesId} />
        <SpecFields legend="Replacement" draft={candidate} onChange={setCandidate} packagesId={packagesId} />
      </div>
      <Result
        id="transistor"
        tone={
          !result ? 'neutral' : !result.ok || verdict === 'refuse' ? 'bad' : verdict === 'accept' ? 'good' : 'caution'
        }
      >
        {!result ? (
          <Prompt>Fill in type, the three ratings and the package of both parts.</Prompt>
        ) : !result.ok ? (
          <p className="font-semibold">{result.error}</p>
        ) : (
          <>
            <Big>
              {verdict === 'accept'
                ? 'Suitable substitute'
                : verdict === 'accept-with-warnings'
                  ? 'Suitable, with care'
                  : 'Not a substitute'}
            </Big>
            {result.value.refusals.length > 0 && (
              <ul className="mt-1 list-disc space-y-1 pl-5 font-semibold">
                {result.value.refusals.map((r) => (
                  <li key={r}>{r}</li>
                ))}
              </ul>
            )}
            {result.value.warnings.length > 0 && (
              <ul className="mt-1 list-disc space-y-1 pl-5 text-ink">
                {result.value.warnings.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            )}
            {result.value.passed.length > 0 && (
              <p className="mt-2 text-sm text-ink-soft">Passed: {result.value.passed.join(' ')}</p>
            )}
            <p className="mt-1 text-sm text-ink-soft">
              Gain, speed and gate threshold are compared only when given for both parts. Check the datasheets before
              fitting.
            </p>
          </>
        )}
      </Result>
      <Examples>
        <ExampleButton
          onClick={() => {
            setOriginal(REF_ORIGINAL);
            setCandidate(REF_CANDIDATE);
          }}
        >
          Worked example: 400 V / 4 A TO-220
        </ExampleButton>
        <ExampleButton
          onClick={() => {
            setOriginal({ ...EMPTY_SPEC, v: '400', i: '1.5', p: '20', pkg: 'TO-126' });
            setCandidate({ ...EMPTY_SPEC, v: '400', i: '4', p: '75', pkg: 'TO-220' });
          }}
        >
          TO-126 → TO-220
        </ExampleButton>
      </Examples>
    </>
  );
}

// ——— diode test ———

const LEAD = { B: 'base', C: 'collector', E: 'emitter' } as const;
const EMPTY_READINGS: Record<ProbePair, string> = { BE: '', EB: '', BC: '', CB: '', CE: '', EC: '' };
const GOOD_NPN: Record<ProbePair, string> = { BE: '0.65', EB: 'OL', BC: '0.62', CB: 'OL', CE: 'OL', EC: 'OL' };
const SHORT_BC: Record<ProbePair, string> = { BE: '0.66', EB: 'OL', BC: '0.002', CB: '0.003', CE: '0.66', EC: 'OL' };

function DiodeTest() {
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

// ——— earth limit ———

function EarthLimit() {
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

const BODIES: Record<CalculatorId, () => ReactNode> = {
  'resistor-bands': ResistorBands,
  'resistor-code': ResistorCode,
  'e-series': ESeries,
  'mains-peak': MainsPeak,
  discharge: Discharge,
  measure: Measure,
  transistor: Transistor,
  'diode-test': DiodeTest,
  'earth-limit': EarthLimit,
};
