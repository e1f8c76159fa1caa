import { DISCHARGE_SOURCE } from '../../../../../../shared/calculators/capacitors';
import { E_SERIES_SOURCE } from '../../../../../../shared/calculators/e-series';
import { MAINS_PEAK_SOURCE } from '../../../../../../shared/calculators/mains';
import { MEASURE_SOURCE } from '../../../../../../shared/calculators/measure';
import { RESISTOR_CODE_SOURCE } from '../../../../../../shared/calculators/resistors';
import { TRANSISTOR_SOURCE } from '../../../../../../shared/calculators/transistors';
import { CAUTIONS, LOCAL_RULES_PREVAIL } from '../../../../../../shared/safety/cautions';
import { SAFETY_SOURCE } from '../../../../../../shared/safety/limits';

/** The bench calculators: their order, titles, sources and cautions. */
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

export interface CalculatorMeta {
  title: string;
  summary: string;
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

export const META: Record<CalculatorId, CalculatorMeta> = {
  'resistor-bands': {
    title: 'Resistor colour bands',
    summary: '4 or 5 bands to a value and tolerance.',
    source: RESISTOR_CODE_SOURCE,
    cautions: [
      'Read the colours in daylight: brown, red and orange look alike under warm light, and heat darkens them. Confirm with a meter, out of circuit.',
    ],
  },
  'resistor-code': {
    title: 'Printed resistor codes',
    summary: '103, 1002, 4R7, 4K7 and tolerance letters.',
    source: RESISTOR_CODE_SOURCE,
    cautions: ['A burnt resistor usually failed for a reason: find the cause before fitting a new one.'],
  },
  'e-series': {
    title: 'Nearest standard value',
    summary: 'The closest E6, E12 or E24 value, and the ones either side.',
    source: `${E_SERIES_SOURCE}; "nearest" by ratio (derived)`,
    cautions: [
      'Match the power rating and the kind of resistor too: a fusible or flameproof resistor in a mains supply is replaced by the same kind, never a plain one.',
    ],
  },
  'mains-peak': {
    title: 'Rectified mains peak',
    summary: 'The DC on the reservoir capacitor: Vrms × √2.',
    source: MAINS_PEAK_SOURCE,
    cautions: [CAUTIONS.capacitors.text, LOCAL_RULES_PREVAIL],
  },
  discharge: {
    title: 'Capacitor discharge',
    summary: 'Safe to touch yet? How long through a resistor?',
    source: `${DISCHARGE_SOURCE}. Thresholds: IEC 61140 (extra-low voltage), IEC 60204-1 6.2.4 and IEC 60335-1 22.5 (secondary sources)`,
    cautions: [
      CAUTIONS.capacitors.text,
      'Never short the terminals with a screwdriver. Microwave-oven capacitors stay outside what groups open.',
      LOCAL_RULES_PREVAIL,
    ],
  },
  measure: {
    title: 'Measured resistance',
    summary: 'Subtract the leads; within tolerance or not.',
    source: MEASURE_SOURCE,
    cautions: [
      'Measure with the item unplugged and its capacitors discharged. In circuit, parts in parallel make a resistor read low: lift one leg to be sure.',
    ],
  },
  transistor: {
    title: 'Transistor substitute',
    summary: 'Can this part replace the original?',
    source: TRANSISTOR_SOURCE,
    cautions: [
      'A failed power transistor often takes its driver, snubber or fuse with it: check the parts around it before powering up, ideally through a bulb or a variac.',
      LOCAL_RULES_PREVAIL,
    ],
  },
  'diode-test': {
    title: 'Transistor diode test',
    summary: 'Six readings to good, failed or unclear.',
    source: TRANSISTOR_SOURCE,
    cautions: ['Test out of circuit with the item unplugged: the parts around a transistor change the readings.'],
  },
  'earth-limit': {
    title: 'Earth limit for the cord',
    summary: 'Protective conductor resistance limit from cord length.',
    source: `${SAFETY_SOURCE}; UK-style limit from the IET Code of Practice, from memory`,
    cautions: [LOCAL_RULES_PREVAIL],
  },
};

export const isCalculatorId = (s: string | null | undefined): s is CalculatorId =>
  Boolean(s) && (ORDER as string[]).includes(s!);
