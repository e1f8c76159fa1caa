import type { Equipment, Skill } from '../constants';

/**
 * The seeded item taxonomy. WEEE categories: Directive 2012/19/EU Annex III (6 open-scope categories, from
 * 15 Aug 2018); `null` for non-electrical items. Weights: Statistics Netherlands open e-waste dataset, table of
 * UNU-KEY average weights (2020), unless the source says otherwise.
 */
export interface CategorySeed {
  slug: string;
  name: string;
  weeeCategory: 1 | 2 | 3 | 4 | 5 | 6 | null;
  unuKey: string | null;
  avgWeightKg: number;
  weightSource: string;
  skill: Skill;
  equipment: Equipment[];
  repairMinutes: number;
  mains: boolean;
  /** Common practice: groups refuse these by default; the reason and a suggestion are shown to the visitor. */
  refusal?: { reason: string; suggestion: string };
}

/** Source line of a weight taken from the UNU-KEY table. */
export const UNU = (key: string) => `Statistics Netherlands e-waste dataset, UNU-KEY ${key} average weight (2020)`;
/** What a mains item needs on the bench: a meter and an appliance safety tester. */
export const SAFETY: Equipment[] = ['multimeter', 'appliance-safety-tester'];
