import type { PartRatings, PartType } from '../../../../../shared/salvage/constants';
import { SelectField, TextField } from '../../../components/ui/field';
import { decodePrintedCode } from '../../../../../shared/calculators/resistors';
import type { Language } from '../../../../../shared/i18n/languages';
import { useT } from '../../../lib/i18n';
import { formatNumber, formatOhmsIn } from './numbers';

/** Ratings as typed: strings until they are parsed; µF and kΩ are typed as the bench says them. */
export type RatingsDraft = Partial<
  Record<
    | 'polarity'
    | 'voltageV'
    | 'currentA'
    | 'powerW'
    | 'resistanceOhm'
    | 'capacitanceUF'
    | 'temperatureC'
    | 'tolerancePct',
    string
  >
>;

const FIELDS: Record<PartType, (keyof RatingsDraft)[]> = {
  resistor: ['resistanceOhm', 'powerW', 'tolerancePct'],
  capacitor: ['capacitanceUF', 'voltageV'],
  diode: ['voltageV', 'currentA'],
  'bipolar-transistor': ['polarity', 'voltageV', 'currentA', 'powerW'],
  mosfet: ['polarity', 'voltageV', 'currentA', 'powerW'],
  fuse: ['currentA', 'voltageV'],
  'thermal-cutout': ['temperatureC', 'currentA', 'voltageV'],
  motor: ['voltageV', 'powerW'],
  switch: ['voltageV', 'currentA'],
  'power-supply': ['voltageV', 'currentA'],
  cable: ['currentA', 'voltageV'],
  other: ['voltageV', 'currentA', 'powerW'],
};
const ERROR_KEY: Partial<Record<keyof RatingsDraft, string>> = { capacitanceUF: 'capacitanceF' };

export function RatingFields({
  type,
  value,
  onChange,
  errors = {},
}: {
  type: PartType;
  value: RatingsDraft;
  onChange: (v: RatingsDraft) => void;
  errors?: Record<string, string>;
}) {
  const t = useT();
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      {FIELDS[type].map((k) =>
        k === 'polarity' ? (
          <SelectField
            key={k}
            label={t(`bench.tool.rating.${k}`)}
            value={value.polarity ?? ''}
            onChange={(e) => onChange({ ...value, polarity: e.target.value })}
          >
            <option value="">{t('bench.tool.rating.unknown')}</option>
            {(type === 'mosfet' ? ['N', 'P'] : ['NPN', 'PNP']).map((p) => (
              <option key={p} value={p}>
                {type === 'mosfet' ? t('bench.tool.rating.channel', { p }) : p}
              </option>
            ))}
          </SelectField>
        ) : (
          <TextField
            key={k}
            label={t(`bench.tool.rating.${k}`)}
            inputMode="decimal"
            value={value[k] ?? ''}
            onChange={(e) => onChange({ ...value, [k]: e.target.value })}
            error={errors[`ratings.${ERROR_KEY[k] ?? k}`]}
          />
        ),
      )}
    </div>
  );
}

const n = (s?: string) => (s && s.trim() ? Number(s.trim().replace(',', '.')) : undefined);

/** Resistance as the bench writes it: 4700, 4k7, 4.7k, 1R0 or 2M2. */
function ohms(s?: string): number | undefined {
  if (!s || !s.trim()) return undefined;
  const plain = n(s);
  if (plain !== undefined && !Number.isNaN(plain)) return plain;
  const t = s.trim().replace(/\s*(Ω|ohms?)$/i, '');
  const dotted = /^(\d+(?:[.,]\d+)?)([kKmM])$/.exec(t);
  if (dotted) return Number(dotted[1].replace(',', '.')) * (dotted[2].toLowerCase() === 'k' ? 1e3 : 1e6);
  try {
    return decodePrintedCode(t).ohms;
  } catch {
    return Number.NaN;
  }
}

export function parseRatings(d: RatingsDraft): PartRatings {
  const out: PartRatings = {};
  if (d.polarity) out.polarity = d.polarity as PartRatings['polarity'];
  for (const k of ['voltageV', 'currentA', 'powerW', 'temperatureC', 'tolerancePct'] as const)
    if (n(d[k]) !== undefined) out[k] = n(d[k]);
  if (ohms(d.resistanceOhm) !== undefined) out.resistanceOhm = ohms(d.resistanceOhm);
  if (n(d.capacitanceUF) !== undefined) out.capacitanceF = n(d.capacitanceUF)! / 1e6;
  return out;
}

/** The ratings in a line, each number as the language writes it. */
export function ratingsText(r: PartRatings, lang: Language = 'en'): string {
  const f = (x: number) => formatNumber(x, lang, 6);
  return [
    r.polarity,
    r.resistanceOhm !== undefined && formatOhmsIn(r.resistanceOhm, lang),
    r.capacitanceF !== undefined && `${formatNumber(r.capacitanceF * 1e6, lang)} µF`,
    r.voltageV !== undefined && `${f(r.voltageV)} V`,
    r.currentA !== undefined && `${f(r.currentA)} A`,
    r.powerW !== undefined && `${f(r.powerW)} W`,
    r.temperatureC !== undefined && `${f(r.temperatureC)} °C`,
    r.tolerancePct !== undefined && `±${f(r.tolerancePct)} %`,
  ]
    .filter(Boolean)
    .join(', ');
}
