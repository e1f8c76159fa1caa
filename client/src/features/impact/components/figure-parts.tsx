import { type ReactNode } from 'react';
import { Link } from 'react-router';
import type { Outcome } from '../../../../../shared/event-day/constants';
import type { Counts } from '../../../../../shared/impact/statistics';
import type { RecordsFilter, StatsFilter } from '../../../../../shared/api/impact';
import { trParts } from '../../../lib/i18n';
import { CO2E, COLOURS, useFormats, type Formats } from './display';
import { OUTCOME_KEYS } from './impact-story';

type T = (key: string, values?: Record<string, unknown>) => string;

export type SeriesKey = 'fixed' | 'partsNeeded' | 'advice' | 'endOfLife';
/** The four outcomes as the charts draw them; `labelKey` is the catalog key of the name. */
export const SERIES: { key: SeriesKey; outcome: Outcome; labelKey: string; colour: string }[] = [
  { key: 'fixed', outcome: 'fixed', labelKey: OUTCOME_KEYS.fixed, colour: COLOURS.fixed },
  { key: 'partsNeeded', outcome: 'parts-needed', labelKey: OUTCOME_KEYS['parts-needed'], colour: COLOURS.partsNeeded },
  { key: 'advice', outcome: 'advice', labelKey: OUTCOME_KEYS.advice, colour: COLOURS.advice },
  { key: 'endOfLife', outcome: 'end-of-life', labelKey: OUTCOME_KEYS['end-of-life'], colour: COLOURS.endOfLife },
];

export type TileKey = 'items' | SeriesKey | 'fixRate' | 'kgDiverted' | 'co2eKg';
export interface Tile {
  key: TileKey;
  label: ReactNode;
  outcome?: Outcome;
  accent: string;
  value: (c: Counts) => string;
}
/** The dashboard's totals, named in the reader's language. */
export const tiles = (t: T, { whole, oneDp, percent }: Formats): Tile[] => [
  { key: 'items', label: t('figures.tile.items'), accent: 'border-navy', value: (c) => whole.format(c.items) },
  ...SERIES.map((s): Tile => ({
    key: s.key,
    label: t(s.labelKey),
    outcome: s.outcome,
    accent: { fixed: 'border-sage', partsNeeded: 'border-copper', advice: 'border-navy', endOfLife: 'border-ink/30' }[
      s.key
    ],
    value: (c) => whole.format(c[s.key]),
  })),
  {
    key: 'fixRate',
    label: t('figures.tile.fixRate'),
    outcome: 'fixed',
    accent: 'border-sage',
    value: (c) => percent(c.fixRate),
  },
  {
    key: 'kgDiverted',
    label: t('figures.tile.kgDiverted'),
    outcome: 'fixed',
    accent: 'border-sage',
    value: (c) => oneDp.format(c.kgDiverted),
  },
  {
    key: 'co2eKg',
    label: trParts('figures.tile.co2e', { co2e: CO2E }),
    outcome: 'fixed',
    accent: 'border-sage',
    value: (c) => oneDp.format(c.co2eKg),
  },
];

export type RecordsExtra = Omit<RecordsFilter, keyof StatsFilter | 'page'>;

export function FigureTable({ head, children }: { head: string[]; children: ReactNode }) {
  return (
    <table className="w-full text-sm">
      <thead>
        <tr className="border-b border-ink/10 text-ink-soft">
          {head.map((h, i) => (
            <th key={h} scope="col" className={`py-1 pr-3 font-semibold ${i === 0 ? 'text-left' : 'text-right'}`}>
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody className="divide-y divide-ink/5">{children}</tbody>
    </table>
  );
}

export function NumberCell({ value, to }: { value: number; to: string }) {
  const { whole } = useFormats();
  return (
    <td className="py-1 pr-3 text-right tabular-nums">
      {value > 0 ? (
        <Link to={to} className="text-navy underline">
          {whole.format(value)}
        </Link>
      ) : (
        whole.format(value)
      )}
    </td>
  );
}
