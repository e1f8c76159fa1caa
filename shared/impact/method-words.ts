import { CATEGORY_SEEDS } from '../categories/seeds';
import { UNU } from '../categories/seed-type';
import { EMISSION_FACTORS, FACTOR_SOURCE, factorKindFor } from './factors';

/**
 * The method's words as catalog keys (`figures` namespace) and values, so the API says them in the reader's
 * language. A publication's title stays as published inside the sentence; the sentence around it is ours.
 */
export interface Words {
  key: string;
  values?: Record<string, string | number>;
}

/** The method's lines, in the order every impact page shows them. */
export const METHOD_LINES = ['items', 'kilograms', 'emissions', 'fixRate', 'noOutcome', 'imported'] as const;
export const methodLines = (displacement: string): Words[] =>
  METHOD_LINES.map((line) => ({
    key: `figures.method.line.${line}`,
    ...(line === 'emissions' ? { values: { factor: displacement } } : {}),
  }));

/** The seeded weight sources that are not a UNU-KEY line, each with its words. */
const SEEDED_WEIGHT: Record<string, string> = {
  toy: 'toy',
  clothing: 'clothing',
  'bag-textile': 'memoryWeigh',
  jewellery: 'memoryWeigh',
  mechanical: 'memoryWeigh',
  'gas-appliance': 'memory',
  bicycle: 'bicycle',
  'wooden-chair': 'ademeChair',
  table: 'ademeTable',
};
/** Sources that rest on memory: people outside the group read them as estimates (see for-readers.ts). */
const FROM_MEMORY = new Set(['toy', 'clothing', 'memoryWeigh', 'memory']);

const seeds = new Map(CATEGORY_SEEDS.map((c) => [c.slug, c]));

/**
 * A kind of item's weight source in words, while it is the seeded source; null for an admin's own wording (shown as
 * typed). `forReaders` gives the wording for people outside the group, where a figure from memory is an estimate.
 */
export function weightSourceWords(slug: string, stored: string, forReaders = false): Words | null {
  const seed = seeds.get(slug);
  if (!seed || seed.weightSource !== stored) return null;
  if (seed.unuKey && stored === UNU(seed.unuKey)) return { key: 'figures.source.unu', values: { key: seed.unuKey } };
  const words = SEEDED_WEIGHT[slug];
  if (!words) return null;
  return { key: `figures.source.${words}${forReaders && FROM_MEMORY.has(words) ? '.readers' : ''}` };
}

/** A kind of item's emission factor source in words, while it is the seeded one; null for an admin's own. */
export function factorSourceWords(slug: string, stored: string | null): Words | null {
  const seed = seeds.get(slug);
  const kind = seed && factorKindFor(seed);
  if (!kind || stored !== `${EMISSION_FACTORS[kind].label}: ${FACTOR_SOURCE}`) return null;
  return { key: 'figures.source.factor', values: { label: EMISSION_FACTORS[kind].label } };
}
