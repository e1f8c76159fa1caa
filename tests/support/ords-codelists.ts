/**
 * The Open Repair Data Standard v0.3 codelists as REFERENCE.md §5 writes them out (the standard's text): the outside
 * values the export and import tests check against. Copied by hand, not imported from shared/, on purpose.
 */
export const ORDS_STATUS_TEXTS = ['Unknown', 'Fixed', 'Repairable', 'End of life'];
export const ORDS_BARRIER_TEXTS = [
  'Spare parts not available',
  'Spare parts too expensive',
  'No way to open product',
  'Repair information not available',
  'Lack of equipment',
  'Item too worn out',
];
