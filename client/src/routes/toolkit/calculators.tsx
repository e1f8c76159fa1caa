import { Calculators } from '../../features/toolkit/components/calculators-page';

/** /toolkit/calculators: the bench calculators; nothing to load, every sum is worked out in the browser. */
export function CalculatorsPage() {
  return <Calculators />;
}
