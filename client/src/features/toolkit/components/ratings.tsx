import type { PartRatings, PartType } from '../../../../../shared/salvage/constants';
import { SelectField, TextField } from '../../../components/ui/field';
import { decodePrintedCode, formatOhms } from '../../../../../shared/calculators/resistors';

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
const LABELS: Record<keyof RatingsDraft, string> = {
  polarity: 'Polarity',
  voltageV: 'Voltage (V)',
  currentA: 'Current (A)',
  powerW: 'Power (W)',
  resistanceOhm: 'Resistance (Ω, e.g. 4k7)',
  capacitanceUF: 'Capacitance (µF)',
  temperatureC: 'Trip temperature (°C)',
  tolerancePct: 'Tolerance (%)',
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
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      {FIELDS[type].map((k) =>
        k === 'polarity' ? (
          <SelectField
            key={k}
            label={LABELS[k]}
            value={value.polarity ?? ''}
            onChange={(e) => onChange({ ...value, polarity: e.target.value })}
          >
            <option value="">Not known</option>
            {(type === 'mosfet' ? ['N', 'P'] : ['NPN', 'PNP']).map((p) => (
              <option key={p} value={p}>
                {type === 'mosfet' ? `${p}-channel` : p}
              </option>
            ))}
          </SelectField>
        ) : (
          <TextField
            key={k}
            label={LABELS[k]}
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

export function ratingsText(r: PartRatings): string {
  return [
    r.polarity,
    r.resistanceOhm !== undefined && formatOhms(r.resistanceOhm),
    r.capacitanceF !== undefined && `${Math.round(r.capacitanceF * 1e6 * 1000) / 1000} µF`,
    r.voltageV !== undefined && `${r.voltageV} V`,
    r.currentA !== undefined && `${r.currentA} A`,
    r.powerW !== undefined && `${r.powerW} W`,
    r.temperatureC !== undefined && `${r.temperatureC} °C`,
    r.tolerancePct !== undefined && `±${r.tolerancePct} %`,
  ]
    .filter(Boolean)
    .join(', ');
}
