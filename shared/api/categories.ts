import type { Equipment, Skill } from '../constants';

/** A kind of item as the API answers it: its weight and factor with their sources, the skill and kit it needs. */
export interface Category {
  id: number;
  slug: string;
  name: string;
  weeeCategory: number | null;
  unuKey: string | null;
  avgWeightKg: number;
  weightSource: string;
  skill: Skill;
  equipment: Equipment[];
  repairMinutes: number;
  mains: boolean;
  refusal: { reason: string; suggestion: string } | null;
  co2ePerKg: number | null;
  co2eSource: string | null;
}
