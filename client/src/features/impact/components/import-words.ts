import type { ImportField } from '../../../../../shared/impact/open-repair-data';

/** Our own words for the fields a file brings; the standard's column names stay in the file. */
export const IMPORT_FIELD_WORDS: Record<string, string> = {
  id: 'Record number',
  data_provider: 'Source',
  country: 'Country',
  partner_product_category: 'Your kind of item',
  product_category: 'Kind of item',
  brand: 'Brand',
  year_of_manufacture: 'Year made',
  product_age: 'Age in years',
  repair_status: 'Outcome',
  repair_barrier_if_end_of_life: 'Why it could not be mended',
  group_identifier: 'Group',
  event_date: 'Session date',
  problem: 'Fault',
} satisfies Record<ImportField, string>;

export const KIND_WORDS: Record<string, string> = {
  'ords-0.3': 'An Open Repair Data file (version 0.3): its columns are read as they are.',
  'ords-0.2': 'An Open Repair Data file (version 0.2): its columns are read as they are.',
  plain: 'A spreadsheet of your own: say which column holds what.',
};
