import { useId, type ReactNode } from 'react';
import { parseOhms } from '../../../../../../shared/calculators/resistors';
import { CalcError, type Said } from '../../../../../../shared/calculators/said';
import { Button } from '../../../../components/ui/button';
import { type CalculatorId } from './meta';
import { tr, useLanguage } from '../../../../lib/i18n';
import { formatNumber, formatOhmsIn } from '../numbers';

// ——— small pieces shared by the calculators ———

export type Attempt<T> = { ok: true; value: T } | { ok: false; error: Said | string };
/**
 * The shared calculators refuse their input with a CalcError, a code and values meant for the fixer (worded by
 * saidIn); show it rather than crash.
 */
export function attempt<T>(fn: () => T): Attempt<T> {
  try {
    return { ok: true, value: fn() };
  } catch (e) {
    return { ok: false, error: e instanceof CalcError ? e.said : e instanceof Error ? e.message : String(e) };
  }
}

/** undefined when empty, NaN when not a number; a comma decimal is accepted. */
export const num = (s: string) => (s.trim() === '' ? undefined : Number(s.trim().replace(',', '.')));
export const bad = (s: string) => Number.isNaN(num(s) as number);
export const show = (x: number, dp = 3) => String(Number(x.toFixed(dp)));

/** A figure as `show` rounds it, and a resistance, both written the way the active language writes numbers. */
export function useFormats() {
  const lang = useLanguage();
  return {
    lang,
    fmt: (x: number, dp = 3) => formatNumber(Number(x.toFixed(dp)), lang, dp),
    ohms: (x: number) => formatOhmsIn(x, lang),
  };
}

export const ohmsHint = () => tr('bench.calc.ohmsHint');
export const ohmsError = (s: string) => (Number.isNaN(parseOhms(s) as number) ? tr('bench.calc.ohmsError') : undefined);

/** What a meter shows for an open circuit: the same in every language. */
const OL = 'OL';

export type Tone = 'neutral' | 'good' | 'bad' | 'caution';
export const TONES: Record<Tone, string> = {
  neutral: 'bg-ink/5',
  good: 'bg-sage-light',
  bad: 'bg-alert-light text-alert',
  caution: 'bg-copper-light',
};

export function Result({ id, tone = 'neutral', children }: { id: CalculatorId; tone?: Tone; children: ReactNode }) {
  return (
    <div data-testid={`result-${id}`} aria-live="polite" className={`rounded-lg px-4 py-3 ${TONES[tone]}`}>
      {children}
    </div>
  );
}

export const Prompt = ({ children }: { children: ReactNode }) => <p className="text-ink-soft">{children}</p>;
export const Big = ({ children }: { children: ReactNode }) => (
  <p className="text-2xl font-extrabold text-navy">{children}</p>
);

export function Examples({ children }: { children: ReactNode }) {
  return <div className="flex flex-wrap gap-2">{children}</div>;
}
export function ExampleButton({ onClick, children }: { onClick: () => void; children: ReactNode }) {
  return (
    <Button type="button" variant="secondary" onClick={onClick}>
      {children}
    </Button>
  );
}

/** Tiles that are radio buttons, as on the item page: the focus ring shows on the tile. */
export const TILE_FOCUS =
  'has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-copper has-[:focus-visible]:ring-offset-2';
export function Tiles<T extends string>({
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
export function OlButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <Button type="button" variant="secondary" className="mt-7" onClick={onClick} aria-label={label}>
      {OL}
    </Button>
  );
}

export function QuickFill({
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
