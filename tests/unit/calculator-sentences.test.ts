/** Every sentence the diode test and the measured-resistance check can write is found by computedText (else it would stay English). */
import { describe, expect, it, vi } from 'vitest';
vi.mock('../../client/src/lib/i18n', () => ({ tr: (k: string, v?: object) => `${k} ${JSON.stringify(v ?? {})}` }));
import { computedText } from '../../client/src/features/toolkit/components/computed';
import {
  checkSubstitution,
  interpretDiodeTest,
  type DiodeReadings,
  type TransistorSpec,
} from '../../shared/calculators/transistors';
import { judgeResistance } from '../../shared/calculators/measure';
import { judgeSubstitute, type Needed } from '../../shared/salvage/match';
import { decodeBands, decodePrintedCode } from '../../shared/calculators/resistors';
import { nearestStandard } from '../../shared/calculators/e-series';
import { rectifiedPeak } from '../../shared/calculators/mains';
import { dischargeAdvice } from '../../shared/calculators/capacitors';
import { protectiveConductorLimitOhm } from '../../shared/safety/limits';

const cases: DiodeReadings[] = [
  { BE: 0.65, EB: 'OL', BC: 0.62, CB: 'OL', CE: 'OL', EC: 'OL' },
  { BE: 0.66, EB: 'OL', BC: 0.002, CB: 0.003, CE: 0.66, EC: 'OL' },
  { BE: 0.001, EB: 0.001, BC: 0.62, CB: 'OL', CE: 'OL', EC: 'OL' },
  { BE: 0.5, EB: 0.5, BC: 0.62, CB: 'OL', CE: 'OL', EC: 'OL' },
  { BE: 'OL', EB: 'OL', BC: 0.62, CB: 'OL', CE: 'OL', EC: 'OL' },
  { BE: 0.65, EB: 'OL', BC: 'OL', CB: 0.62, CE: 'OL', EC: 'OL' },
  { BE: 0.65, EB: 'OL', BC: 0.62, CB: 'OL', CE: 'OL', EC: 0.5 },
  { BE: 0.65, EB: 'OL', BC: 0.62, CB: 'OL', CE: 0.5, EC: 'OL' },
  { BE: 0.2, EB: 'OL', BC: 1.3, CB: 'OL', CE: 'OL', EC: 'OL' },
  { BE: 0.6, EB: 'OL', BC: 0.68, CB: 'OL', CE: 'OL', EC: 'OL' },
];
describe("the shared calculators' sentences in other languages", () => {
  it('every diode sentence has a key', () => {
    for (const c of cases)
      for (const r of interpretDiodeTest(c).reasons) {
        const out = computedText(r, 'de');
        expect(out).not.toBe(r);
      }
    for (const bad of [
      { ...cases[0], BE: -1 },
      { ...cases[0], BE: 650 },
    ]) {
      try {
        interpretDiodeTest(bad as DiodeReadings);
      } catch (e) {
        const out = computedText((e as Error).message, 'de');
        expect(out).not.toBe((e as Error).message);
      }
    }
  });
  it('every measure sentence has a key', () => {
    for (const input of [
      { reading: 'OL' as const, nominalOhm: 1, tolerancePct: 5 },
      { reading: 1.2, leadsOhm: 0.1, nominalOhm: 1, tolerancePct: 5, uncertaintyOhm: 0.1 },
      { reading: 1.05, nominalOhm: 1, tolerancePct: 5 },
      { reading: 1.01, nominalOhm: 1, tolerancePct: 5 },
      { reading: 2, nominalOhm: 1, tolerancePct: 5 },
      { reading: 0.1, leadsOhm: 0.1, nominalOhm: 1, tolerancePct: 5 },
    ]) {
      const m = judgeResistance(input).message;
      const out = computedText(m, 'fr');
      expect(out).not.toBe(m);
    }
  });
  it('every sentence of the substitute check has a key', () => {
    const base: TransistorSpec = { type: 'NPN', vMaxV: 400, iMaxA: 4, ptotW: 75, package: 'TO-220', pinout: 'BCE' };
    const pairs: [TransistorSpec, TransistorSpec][] = [
      [base, { ...base, vMaxV: 450 }],
      [base, { ...base, iMaxA: 4.5 }],
      [base, { ...base, type: 'PNP' }],
      [base, { ...base, type: 'N-MOSFET', pinout: 'GDS' }],
      [base, { ...base, vMaxV: 300, iMaxA: 2, ptotW: 40 }],
      [base, { ...base, package: 'TO-247', pinout: 'ECB' }],
      [base, { ...base, package: 'TO-126', pinout: undefined }],
      [base, { ...base, package: 'TO-220F' }],
      [{ ...base, package: 'TO-220F' }, base],
      [base, { ...base, package: 'SOT-223' }],
      [base, { ...base, package: 'XYZ-9' }],
      [
        { ...base, hfeMin: 20, ftMHz: 10, fallTimeNs: 100 },
        { ...base, hfeMin: 10, ftMHz: 4, fallTimeNs: 300 },
      ],
      [
        { ...base, hfeMin: 10, ftMHz: 4, fallTimeNs: 300 },
        { ...base, hfeMin: 20, ftMHz: 10, fallTimeNs: 100 },
      ],
      [
        { ...base, type: 'N-MOSFET', pinout: 'GDS', vgsThMaxV: 2 },
        { ...base, type: 'N-MOSFET', pinout: 'GDS', vgsThMaxV: 4 },
      ],
      [
        { ...base, type: 'N-MOSFET', pinout: 'GDS', vgsThMaxV: 4 },
        { ...base, type: 'N-MOSFET', pinout: 'GDS', vgsThMaxV: 2 },
      ],
    ];
    let checked = 0;
    for (const [o, c] of pairs) {
      const r = checkSubstitution(o, c);
      for (const line of [...r.refusals, ...r.warnings, ...r.passed])
        if (/\p{L}{3,}|\d\.\d/u.test(line.replace(/Vceo|Ptot|MHz/g, ''))) {
          checked++;
          expect(computedText(line, 'nl')).not.toBe(line);
        }
    }
    expect(checked).toBeGreaterThan(20);
    for (const bad of [
      { ...base, vMaxV: 0 },
      { ...base, hfeMin: -1 },
      { ...base, package: ' ' },
      { ...base, pinout: 'XY' },
    ]) {
      let message = '';
      try {
        checkSubstitution(bad, base);
      } catch (e) {
        message = (e as Error).message;
      }
      expect(message).not.toBe('');
      expect(computedText(message, 'fr')).not.toBe(message);
    }
  });
  it('every sentence of the salvage match has a key', () => {
    const part = (type: Needed['type'], ratings: Needed['ratings'], pkg?: string): Needed => ({
      type,
      ratings,
      package: pkg,
    });
    const pairs: [Needed, Needed][] = [
      [part('resistor', {}), part('capacitor', {})],
      [part('bipolar-transistor', {}), part('mosfet', {})],
      [part('resistor', { resistanceOhm: 100, powerW: 1 }), part('resistor', { resistanceOhm: 220, powerW: 0.25 })],
      [part('resistor', { resistanceOhm: 100, powerW: 1 }), part('resistor', {})],
      [
        part('capacitor', { capacitanceF: 1e-4, voltageV: 400 }),
        part('capacitor', { capacitanceF: 1e-5, voltageV: 200 }),
      ],
      [part('fuse', {}), part('fuse', { currentA: 3 })],
      [part('fuse', { currentA: 3 }), part('fuse', {})],
      [part('fuse', { currentA: 3 }), part('fuse', { currentA: 13 })],
      [part('fuse', { currentA: 13 }), part('fuse', { currentA: 3 })],
      [part('thermal-cutout', { temperatureC: 150 }), part('thermal-cutout', { temperatureC: 120 })],
      [part('power-supply', { voltageV: 12 }), part('power-supply', { voltageV: 9 })],
      [part('power-supply', { voltageV: 12 }), part('power-supply', {})],
      [part('switch', { voltageV: 250 }, 'TO-220'), part('switch', {}, 'TO-126')],
      [part('bipolar-transistor', {}), part('bipolar-transistor', { polarity: 'NPN', voltageV: 400, currentA: 4 })],
      [part('bipolar-transistor', { polarity: 'NPN', voltageV: 400, currentA: 4 }), part('bipolar-transistor', {})],
      [
        part('bipolar-transistor', { polarity: 'NPN', voltageV: 400, currentA: 4 }, 'TO-220'),
        part('bipolar-transistor', { polarity: 'NPN', voltageV: 450, currentA: 5 }, 'TO-220'),
      ],
    ];
    let checked = 0;
    for (const [n, c] of pairs) {
      const v = judgeSubstitute(n, c);
      for (const line of [...v.reasons, ...v.warnings])
        if (!/^(Vceo|Ic|Ptot|Vds|Id|fT) [\d.]+ \w+ ≥/.test(line)) {
          checked++;
          expect(computedText(line, 'de'), line).not.toBe(line);
        }
    }
    expect(checked).toBeGreaterThan(15);
  });
  it('every note and refusal of the other calculators has a key', () => {
    const thrown = (fn: () => unknown) => {
      try {
        fn();
      } catch (e) {
        return (e as Error).message;
      }
      throw new Error('did not throw');
    };
    const lines = [
      ...['000', '103', '1002', '47K', '100K', '1001J'].flatMap((c) => decodePrintedCode(c).notes),
      thrown(() => decodePrintedCode('12Q')),
      thrown(() => decodePrintedCode('hello')),
      thrown(() => decodeBands(['black', 'red', 'red', 'gold'])),
      thrown(() => nearestStandard(0, 'E24')),
      thrown(() => rectifiedPeak(500)),
      thrown(() => dischargeAdvice({ voltageV: 300, capacitanceF: 0 })),
      thrown(() => dischargeAdvice({ voltageV: -1, capacitanceF: 1e-4 })),
      thrown(() => dischargeAdvice({ voltageV: 300, capacitanceF: 1e-4, resistanceOhm: 0 })),
      thrown(() => protectiveConductorLimitOhm(-1)),
    ];
    expect(lines.length).toBeGreaterThan(12);
    for (const line of lines) expect(computedText(line, 'fr'), line).not.toBe(line);
  });
});
