/** The bench calculators: their order, and the catalog keys of their sources and cautions. */
export type CalculatorId =
  | 'resistor-bands'
  | 'resistor-code'
  | 'e-series'
  | 'mains-peak'
  | 'discharge'
  | 'measure'
  | 'transistor'
  | 'diode-test'
  | 'earth-limit';

/** Keys in the bench catalog; a calculator's title is `bench.tool.link.<id>` and its summary `bench.calc.<id>.summary`. */
export interface CalculatorMeta {
  source: string;
  cautions: string[];
}

export const ORDER: CalculatorId[] = [
  'resistor-bands',
  'resistor-code',
  'e-series',
  'mains-peak',
  'discharge',
  'measure',
  'transistor',
  'diode-test',
  'earth-limit',
];

/** Shared with the item page's cautions: shared/safety/cautions.ts CAUTIONS.capacitors and LOCAL_RULES_PREVAIL. */
const CAPACITORS = 'bench.calc.caution.capacitors';
const LOCAL_RULES = 'bench.calc.caution.localRules';

export const META: Record<CalculatorId, CalculatorMeta> = {
  'resistor-bands': { source: 'bench.calc.resistor-bands.source', cautions: ['bench.calc.caution.colours'] },
  'resistor-code': { source: 'bench.calc.resistor-bands.source', cautions: ['bench.calc.caution.burnt'] },
  'e-series': { source: 'bench.calc.e-series.source', cautions: ['bench.calc.caution.sameKind'] },
  'mains-peak': { source: 'bench.calc.mains-peak.source', cautions: [CAPACITORS, LOCAL_RULES] },
  discharge: {
    source: 'bench.calc.discharge.source',
    cautions: [CAPACITORS, 'bench.calc.caution.screwdriver', LOCAL_RULES],
  },
  measure: { source: 'bench.calc.measure.source', cautions: ['bench.calc.caution.measure'] },
  transistor: { source: 'bench.calc.transistor.source', cautions: ['bench.calc.caution.transistor', LOCAL_RULES] },
  'diode-test': { source: 'bench.calc.transistor.source', cautions: ['bench.calc.caution.diode'] },
  'earth-limit': { source: 'bench.calc.earth-limit.source', cautions: [LOCAL_RULES] },
};

export const isCalculatorId = (s: string | null | undefined): s is CalculatorId =>
  Boolean(s) && (ORDER as string[]).includes(s!);
