import type { Outcome } from '../event-day/constants';
import { ORDS_CATEGORY_OF_SLUG, UNPOWERED_KIND_OF_SLUG, type OrdsProductCategory } from './ords-categories';
import type { ImportedRecord } from './ords-reader';

/** Limits on one file brought in: its size, and the refusals kept to show (the count is always exact). */
export const IMPORT_LIMITS = { maxBytes: 30 * 1024 * 1024, maxRows: 200_000, refusalsKept: 1000 } as const;

/** Where no Mendery kind is named after one of the standard's categories, the nearest kind by use and weight. */
const NEAREST_KIND: Partial<Record<OrdsProductCategory, string>> = {
  'Aircon/dehumidifier': 'fridge',
  'Battery/charger/adapter': 'small-it',
  'Decorative or safety lights': 'led-lamp',
  'Digital compact camera': 'small-it',
  'DSLR/video camera': 'small-it',
  Fan: 'food-mixer',
  'Handheld entertainment device': 'game-console',
  'Hi-Fi integrated': 'radio-hifi',
  'Hi-Fi separates': 'radio-hifi',
  'Musical instrument': 'speaker',
  'Paper shredder': 'printer',
  Projector: 'video-player',
  'Sewing machine': 'power-tool',
  'Small home electrical': 'food-mixer',
  Misc: 'small-it',
  'Hair dryer': 'hair-dryer',
};

/** The first Mendery kind the export writes as each of the standard's categories (the export's own table, reversed). */
const KIND_OF_CATEGORY = new Map<string, string>();
for (const [slug, c] of Object.entries(ORDS_CATEGORY_OF_SLUG))
  if (!KIND_OF_CATEGORY.has(c)) KIND_OF_CATEGORY.set(c, slug);
const KIND_OF_UNPOWERED = new Map<string, string>();
for (const [slug, k] of Object.entries(UNPOWERED_KIND_OF_SLUG))
  if (!KIND_OF_UNPOWERED.has(k.toLowerCase())) KIND_OF_UNPOWERED.set(k.toLowerCase(), slug);

/**
 * The Mendery kind an imported record is counted as: named by the standard's category when the file has one
 * (powered, or "Unpowered - Bicycle" the way the published open data writes it), else by the sheet's own kind
 * when it is one of ours; `fallback` otherwise. The record keeps the file's category as well, for a re-export.
 */
export function kindForRecord(
  r: Pick<ImportedRecord, 'ordsCategory' | 'partnerCategory' | 'powered'>,
  kinds: { slug: string; name: string }[],
  fallback = 'small-it',
): string {
  if (r.ordsCategory) {
    const unpowered = /^unpowered\s*-\s*(.+)$/i.exec(r.ordsCategory);
    if (unpowered) return KIND_OF_UNPOWERED.get(unpowered[1].trim().toLowerCase()) ?? 'mechanical';
    const k = KIND_OF_CATEGORY.get(r.ordsCategory) ?? NEAREST_KIND[r.ordsCategory as OrdsProductCategory];
    if (k) return k;
  }
  const own = r.partnerCategory?.trim().toLowerCase();
  const byName = own ? kinds.find((k) => k.name.toLowerCase() === own || k.slug === own) : undefined;
  if (byName) return byName.slug;
  return r.powered ? fallback : 'mechanical';
}

/**
 * The outcome an imported status becomes. "Repairable" is written as parts needed, the outcome the export writes
 * as Repairable first (shared/impact/visits.ts); no follow-up is opened for it. "Unknown" records no outcome.
 */
export function outcomeForStatus(status: ImportedRecord['status']): Outcome | null {
  if (status === 'unknown') return null;
  if (status === 'repairable') return 'parts-needed';
  return status;
}

/** A group identifier from a file, as a group's address name: lower case, letters, digits and dashes. */
export function slugForIdentifier(identifier: string): string {
  return (
    identifier
      .normalize('NFKD')
      .replace(/[\u0300-\u036f]/g, '')
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 80) || 'group'
  );
}
