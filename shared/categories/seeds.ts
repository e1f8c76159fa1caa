import { HOUSEHOLD_SEEDS } from './household';
import type { CategorySeed } from './seed-type';
import { SCREENS_AND_COMPUTING_SEEDS } from './screens-and-computing';
import { UNPOWERED_AND_REFUSED_SEEDS } from './unpowered-and-refused';

/** The seeded item taxonomy, in the order it is shown (the seed keeps this order as its sort). */
export const CATEGORY_SEEDS: CategorySeed[] = [
  ...HOUSEHOLD_SEEDS,
  ...SCREENS_AND_COMPUTING_SEEDS,
  ...UNPOWERED_AND_REFUSED_SEEDS,
];
