import type { Barrier, Outcome } from '../event-day/constants';
import { REPAIR_STATUS_OF, type RepairStatus } from './visits';

/**
 * The Open Repair Data Standard v0.3 columns, in the order of the published data files (REFERENCE.md §5). The
 * optional `record_date` is left out, as the published files leave it out.
 */
export const ORDS_FIELDS = [
  'id',
  'data_provider',
  'country',
  'partner_product_category',
  'product_category',
  'product_category_id',
  'brand',
  'year_of_manufacture',
  'product_age',
  'repair_status',
  'repair_barrier_if_end_of_life',
  'group_identifier',
  'event_date',
  'problem',
] as const;
export type OrdsField = (typeof ORDS_FIELDS)[number];

/** The v0.3 columns a file may bring; the category's id is read from its text, which every version carries. */
export type ImportField = Exclude<OrdsField, 'product_category_id'>;
export const IMPORT_FIELDS = ORDS_FIELDS.filter((f): f is ImportField => f !== 'product_category_id');
/** The fields a row cannot do without. */
export const REQUIRED_FIELDS: readonly ImportField[] = ['id', 'repair_status', 'event_date'];
/**
 * The Open Repair Data Standard's codelists (v0.3, REFERENCE.md §5). Their wording belongs to the file only: the
 * screens use Mendery's own words (shared/event-day/constants.ts).
 */
export const ORDS_REPAIR_STATUS: Record<RepairStatus | 'unknown', { code: number; text: string }> = {
  unknown: { code: 0, text: 'Unknown' },
  fixed: { code: 1, text: 'Fixed' },
  repairable: { code: 2, text: 'Repairable' },
  'end-of-life': { code: 3, text: 'End of life' },
};

export const ORDS_BARRIER: Record<Barrier, { code: number; text: string }> = {
  'spare-parts-not-available': { code: 1, text: 'Spare parts not available' },
  'spare-parts-too-expensive': { code: 2, text: 'Spare parts too expensive' },
  'no-way-to-open': { code: 3, text: 'No way to open product' },
  'repair-information-not-available': { code: 4, text: 'Repair information not available' },
  'lack-of-equipment': { code: 5, text: 'Lack of equipment' },
  'too-worn-out': { code: 6, text: 'Item too worn out' },
};

/** Fixed → Fixed; a part needed or advice given → Repairable; beyond mending → End of life; none → Unknown. */
export const ordsStatusText = (o: Outcome | null) => ORDS_REPAIR_STATUS[o ? REPAIR_STATUS_OF[o] : 'unknown'].text;

/** The barrier column is filled only where the status is End of life. */
export const ordsBarrierText = (o: Outcome | null, b: Barrier | null) =>
  o && REPAIR_STATUS_OF[o] === 'end-of-life' && b ? ORDS_BARRIER[b].text : '';
