import { type ReactNode } from 'react';
import { Link } from 'react-router';
import { OUTCOME_LABELS, type Outcome } from '../../../../../shared/event-day/constants';
import type { Counts } from '../../../../../shared/impact/statistics';
import type { RecordsFilter, StatsFilter } from '../../../../../shared/api/impact';
import { CO2E, COLOURS, oneDp, percent, whole } from './display';

export const plural = (n: number, one: string, many = `${one}s`) => `${whole.format(n)} ${n === 1 ? one : many}`;

export type SeriesKey = 'fixed' | 'partsNeeded' | 'advice' | 'endOfLife';
export const SERIES: { key: SeriesKey; outcome: Outcome; label: string; colour: string }[] = [
  { key: 'fixed', outcome: 'fixed', label: OUTCOME_LABELS.fixed, colour: COLOURS.fixed },
  { key: 'partsNeeded', outcome: 'parts-needed', label: OUTCOME_LABELS['parts-needed'], colour: COLOURS.partsNeeded },
  { key: 'advice', outcome: 'advice', label: OUTCOME_LABELS.advice, colour: COLOURS.advice },
  { key: 'endOfLife', outcome: 'end-of-life', label: OUTCOME_LABELS['end-of-life'], colour: COLOURS.endOfLife },
];

export type TileKey = 'items' | SeriesKey | 'fixRate' | 'kgDiverted' | 'co2eKg';
export const TILES: {
  key: TileKey;
  label: ReactNode;
  outcome?: Outcome;
  accent: string;
  value: (c: Counts) => string;
}[] = [
  { key: 'items', label: 'Items seen', accent: 'border-navy', value: (c) => whole.format(c.items) },
  {
    key: 'fixed',
    label: OUTCOME_LABELS.fixed,
    outcome: 'fixed',
    accent: 'border-sage',
    value: (c) => whole.format(c.fixed),
  },
  {
    key: 'partsNeeded',
    label: OUTCOME_LABELS['parts-needed'],
    outcome: 'parts-needed',
    accent: 'border-copper',
    value: (c) => whole.format(c.partsNeeded),
  },
  {
    key: 'advice',
    label: OUTCOME_LABELS.advice,
    outcome: 'advice',
    accent: 'border-navy',
    value: (c) => whole.format(c.advice),
  },
  {
    key: 'endOfLife',
    label: OUTCOME_LABELS['end-of-life'],
    outcome: 'end-of-life',
    accent: 'border-ink/30',
    value: (c) => whole.format(c.endOfLife),
  },
  { key: 'fixRate', label: 'Fix rate', outcome: 'fixed', accent: 'border-sage', value: (c) => percent(c.fixRate) },
  {
    key: 'kgDiverted',
    label: 'kg diverted from landfill',
    outcome: 'fixed',
    accent: 'border-sage',
    value: (c) => oneDp.format(c.kgDiverted),
  },
  {
    key: 'co2eKg',
    label: <>kg {CO2E} avoided</>,
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
