import { stringify } from 'csv-stringify/sync';
import { safeCsvCast } from '../../../../shared/files/csv-cells';
import { BARRIER_LABELS, OUTCOME_LABELS } from '../../../../shared/event-day/constants';
import { ORDS_FIELDS, ordsBarrierText, ordsStatusText } from '../../../../shared/impact/open-repair-data';
import { scrubPersonalData } from '../../../../shared/privacy/scrub';
import { ordsCategoryOf } from '../../../../shared/impact/ords-categories';
import type { AppContext } from '../../context';
import { openRepairDataRows, recordFileRows } from './queries/exports';
import type { StatsFilter } from './queries/stats';

/**
 * Personal data stays out of a file: e-mail addresses, phone numbers and the visitor's name in their own words are
 * taken out (shared/privacy/scrub.ts), and the text is kept to one line.
 */
const scrub = (text: string, visitor: string | null) =>
  scrubPersonalData(text, visitor ? [visitor] : [])
    .replace(/\s+/g, ' ')
    .trim();

/**
 * One Open Repair Data file. The codelist covers powered items only, so `powered: false` writes the unpowered
 * records in a file of their own, with the categories the published open data uses for them ("Unpowered - Bicycle")
 * and no product_category_id (docs/decisions/010).
 */
export async function openRepairDataCsv(ctx: AppContext, f: StatsFilter, powered = true): Promise<string> {
  const rows = await openRepairDataRows(ctx.database.db, f);
  return stringify(
    rows.flatMap((r) => {
      const category = ordsCategoryOf({ slug: r.categorySlug, weeeCategory: r.weeeCategory }, r.ordsCategory);
      if (category.powered !== powered) return [];
      const age = r.ageYears === null ? null : Math.round(r.ageYears * 10) / 10;
      return [
        {
          id: `mendery-${r.id}`,
          data_provider: 'Mendery',
          country: r.country ?? '',
          partner_product_category: r.categoryName,
          product_category: category.text,
          product_category_id: category.powered ? category.id : '',
          brand: r.brand ?? '',
          year_of_manufacture: age === null ? '' : String(Math.round(r.startsAt.getUTCFullYear() - age)),
          product_age: age ?? '',
          repair_status: ordsStatusText(r.outcome),
          repair_barrier_if_end_of_life: ordsBarrierText(r.outcome, r.barrier),
          group_identifier: r.groupSlug,
          event_date: r.startsAt.toISOString().slice(0, 10),
          problem: scrub(r.fault, r.visitor),
        },
      ];
    }),
    { header: true, columns: [...ORDS_FIELDS], cast: safeCsvCast },
  );
}

/** The organisers' own file: every recorded detail of each repair, still without names or addresses. */
export async function recordsCsv(ctx: AppContext, f: StatsFilter): Promise<string> {
  const rows = await recordFileRows(ctx.database.db, f);
  return stringify(
    rows.map((r) => ({
      item_id: r.id,
      event_date: r.startsAt.toISOString().slice(0, 10),
      event: r.event,
      booking: r.reference,
      walk_in: r.walkIn ? 'yes' : 'no',
      category: r.category,
      brand: r.brand ?? '',
      model: r.model ?? '',
      age_years: r.ageYears ?? '',
      fault: scrub(r.fault, r.visitor),
      outcome: r.outcome ? OUTCOME_LABELS[r.outcome] : '',
      barrier: r.barrier ? BARRIER_LABELS[r.barrier] : '',
      part: r.part ?? '',
      part_cost: r.partCostCents === null ? '' : (r.partCostCents / 100).toFixed(2),
      part_cost_currency: r.partCostCents === null ? '' : r.currency,
      minutes: r.minutes ?? '',
      weighed_kg: r.weighedKg ?? '',
      kg_counted: r.outcome === 'fixed' ? (r.weighedKg ?? r.avgKg) : '',
      fixer: r.fixer ?? '',
      return_of_item: r.returnOf ?? '',
      notes: r.notes ? scrub(r.notes, r.visitor) : '',
    })),
    {
      header: true,
      cast: safeCsvCast,
      columns: [
        'item_id',
        'event_date',
        'event',
        'booking',
        'walk_in',
        'category',
        'brand',
        'model',
        'age_years',
        'fault',
        'outcome',
        'barrier',
        'part',
        'part_cost',
        'part_cost_currency',
        'minutes',
        'weighed_kg',
        'kg_counted',
        'fixer',
        'return_of_item',
        'notes',
      ],
    },
  );
}
