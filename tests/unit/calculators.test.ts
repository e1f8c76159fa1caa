import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rectifiedPeak } from '../../shared/calculators/mains';
import {
  DEFAULT_TOUCH_THRESHOLD,
  dischargeAdvice,
  ELV_AC,
  ELV_DC,
  maxResistanceFor,
  PLUG_PINS_34V_1S,
  PLUG_PINS_60V_1S,
  RESIDUAL_60V_5S,
  storedEnergyJ,
  timeConstantS,
  timeToVoltage,
  voltageAfter,
} from '../../shared/calculators/capacitors';
import { judgeResistance, netResistance, parseReading } from '../../shared/calculators/measure';
import {
  checkSubstitution,
  interpretDiodeTest,
  type DiodeReadings,
  type TransistorSpec,
} from '../../shared/calculators/transistors';
import { protectiveConductorLimitOhm } from '../../shared/safety/limits';

// Sources are named beside each check, as in the project's reference notes §3–4. IEC 60062 and IEC 60063 values
// are from memory (not checked against the standards); the capacitor and mains figures are derived arithmetic,
// so they are asserted to the decimals the reference gives. Resistor codes and E-series are in resistors.test.ts.

describe('rectified mains peak = Vrms × √2 (derived)', () => {
  it.each([
    [100, 141.421],
    [120, 169.706],
    [220, 311.127],
    [230, 325.269],
    [240, 339.411],
    [253, 357.796],
  ])('%s V rms → %s V DC', (vrms, peak) => expect(rectifiedPeak(vrms).peakV).toBeCloseTo(peak, 3));

  it('reads about 311–312 V DC for 220 V mains, 220 × 1.414 (common practice, no published source)', () => {
    const p = rectifiedPeak(220);
    expect(p.peakV).toBeGreaterThanOrEqual(311);
    expect(p.peakV).toBeLessThanOrEqual(312);
    expect(p.ruleOfThumbV).toBe(311.08);
    expect(p.note).toContain('1.414');
  });

  it('refuses a voltage outside 100–253 V with a message', () => {
    expect(() => rectifiedPeak(99)).toThrow(/100 V to 253 V/);
    expect(() => rectifiedPeak(254)).toThrow(RangeError);
    expect(() => rectifiedPeak(Number.NaN)).toThrow(RangeError);
  });
});

describe('capacitor discharge V(t) = V0·e^(−t/RC) (derived)', () => {
  const C = 100e-6;
  const R = 10_000;
  const V0 = 325.269; // 230 V mains peak, from the table above

  it('has τ = 1 s for 100 µF through 10 kΩ, and 230 V mains charges it to the 325.269 V of the reference', () => {
    expect(timeConstantS(R, C)).toBeCloseTo(1, 12);
    expect(rectifiedPeak(230).peakV).toBeCloseTo(V0, 3);
  });

  it('reaches 60 V at 1.6903 s (IEC 60204-1 threshold), 50 V at 1.8726 s, 34 V at 2.2583 s (IEC 60335-1 threshold)', () => {
    expect(timeToVoltage(V0, RESIDUAL_60V_5S.volts, R, C)).toBeCloseTo(1.6903, 4);
    expect(timeToVoltage(V0, 50, R, C)).toBeCloseTo(1.8726, 4);
    expect(timeToVoltage(V0, PLUG_PINS_34V_1S.volts, R, C)).toBeCloseTo(2.2583, 4);
  });

  it('leaves 2.192 V after 5τ and stores ½CV² = 5.29 J', () => {
    expect(voltageAfter(V0, R, C, 5)).toBeCloseTo(2.192, 3);
    expect(storedEnergyJ(C, V0)).toBeCloseTo(5.29, 2);
  });

  it('needs R ≤ 6293.7 Ω for 470 µF to fall to 60 V within 5 s (IEC 60204-1 60 V within 5 s)', () => {
    expect(maxResistanceFor(V0, RESIDUAL_60V_5S.volts, 470e-6, RESIDUAL_60V_5S.withinS!)).toBeCloseTo(6293.7, 1);
    expect(maxResistanceFor(30, 60, 470e-6, 5)).toBe(Infinity);
  });

  it('names the thresholds with their sources: IEC 61140 120 V ripple-free DC / 50 V AC; IEC 60204-1 60 V within 5 s (plug pins 1 s); IEC 60335-1 34 V after 1 s', () => {
    expect(ELV_DC).toMatchObject({ volts: 120, source: expect.stringContaining('IEC 61140') });
    expect(ELV_AC).toMatchObject({ volts: 50, source: expect.stringContaining('IEC 61140') });
    expect(RESIDUAL_60V_5S).toMatchObject({ volts: 60, withinS: 5, source: expect.stringContaining('IEC 60204-1') });
    expect(PLUG_PINS_60V_1S).toMatchObject({ volts: 60, withinS: 1, source: expect.stringContaining('IEC 60204-1') });
    expect(PLUG_PINS_34V_1S).toMatchObject({ volts: 34, withinS: 1, source: expect.stringContaining('IEC 60335-1') });
    expect(DEFAULT_TOUCH_THRESHOLD).toBe(PLUG_PINS_34V_1S);
  });

  it('advises waiting 2.26 s through 10 kΩ before a 325 V, 100 µF capacitor reaches 34 V, and to measure first (IEC 60335-1 threshold; derived)', () => {
    const a = dischargeAdvice({ voltageV: V0, capacitanceF: C, resistanceOhm: R });
    expect(a.safeToTouch).toBe(false);
    expect(a.waitS).toBeCloseTo(2.2583, 4);
    expect(a.fiveTauS).toBeCloseTo(5, 12);
    expect(a.energyJ).toBeCloseTo(5.29, 2);
    expect(a.peakPowerW).toBeCloseTo(10.58, 2);
    expect(a.messages.join(' ')).toMatch(/not safe to touch.*measure before touching/s);
    expect(a.messages.join(' ')).toContain('10 kΩ');
  });

  it('without a resistor, gives the largest one that meets the threshold in time (IEC 60204-1 60 V within 5 s; derived)', () => {
    const a = dischargeAdvice({ voltageV: V0, capacitanceF: 470e-6, threshold: RESIDUAL_60V_5S });
    expect(a.waitS).toBeNull();
    expect(a.maxOhm).toBeCloseTo(6293.7, 1);
    expect(a.messages.join(' ')).toContain('at most 6294 Ω');
  });

  it('calls 30 V below the 34 V threshold but still says to measure (IEC 60335-1 threshold)', () => {
    const a = dischargeAdvice({ voltageV: 30, capacitanceF: C, resistanceOhm: R });
    expect(a.safeToTouch).toBe(true);
    expect(a.messages[0]).toContain('Measure again');
  });

  it('refuses impossible inputs', () => {
    expect(() => timeToVoltage(V0, 0, R, C)).toThrow(/never quite reaches 0 V/);
    expect(() => voltageAfter(V0, 0, C, 1)).toThrow(RangeError);
    expect(() => dischargeAdvice({ voltageV: -5, capacitanceF: C })).toThrow(RangeError);
  });

  it('discharge time and residual voltage are inverse (property; derived)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 1000, noNaN: true }),
        fc.double({ min: 0.001, max: 0.999, noNaN: true }),
        fc.double({ min: 10, max: 1e6, noNaN: true }),
        fc.double({ min: 1e-7, max: 1e-2, noNaN: true }),
        (v0, share, r, c) => {
          const target = v0 * share;
          const t = timeToVoltage(v0, target, r, c);
          expect(voltageAfter(v0, r, c, t) / target).toBeCloseTo(1, 9);
          // And the largest resistor for that time is the one used.
          expect(maxResistanceFor(v0, target, c, t) / r).toBeCloseTo(1, 9);
        },
      ),
    );
  });
});

describe('measuring a low resistance (common practice, no published source)', () => {
  it('subtracts the shorted leads: a 1 Ω part reading 1.2 Ω with 0.1 Ω leads is 1.1 Ω, +10 %', () => {
    expect(netResistance(1.2, 0.1)).toBe(1.1);
    expect(judgeResistance({ reading: 1.2, leadsOhm: 0.1, nominalOhm: 1, tolerancePct: 5 }).deviationPct).toBe(10);
  });

  it('calls that reading in the right range: at the edge of a ±10 % wirewound, or for a ±5 % part within what a meter with a 0.1 Ω last digit can tell', () => {
    // +10 % is exactly the edge of ±10 %: the edge counts as within.
    expect(judgeResistance({ reading: 1.2, leadsOhm: 0.1, nominalOhm: 1, tolerancePct: 10 })).toMatchObject({
      verdict: 'within',
      inRightRange: true,
    });
    // A ±5 % part: 1.1 Ω is outside 0.95–1.05 Ω on paper, but two readings at 0.1 Ω resolution cannot prove it; "in the right range" means no more than that.
    const fivePct = judgeResistance({
      reading: 1.2,
      leadsOhm: 0.1,
      nominalOhm: 1,
      tolerancePct: 5,
      uncertaintyOhm: 0.1,
    });
    expect(fivePct).toMatchObject({
      verdict: 'within-uncertainty',
      inRightRange: true,
      netOhm: 1.1,
      minOhm: 0.95,
      maxOhm: 1.05,
    });
    expect(fivePct.message).toContain('cannot prove the tolerance');
    // Without allowing for the meter, the same ±5 % reading is outside.
    expect(judgeResistance({ reading: 1.2, leadsOhm: 0.1, nominalOhm: 1, tolerancePct: 5 })).toMatchObject({
      verdict: 'outside',
      inRightRange: false,
    });
  });

  it('reads OL as an open circuit', () => {
    expect(parseReading('OL')).toBe('OL');
    expect(parseReading(' o.l ')).toBe('OL');
    expect(parseReading('1,2')).toBe(1.2);
    expect(parseReading('abc')).toBeNull();
    expect(netResistance('OL', 0.1)).toBe('open');
    expect(judgeResistance({ reading: 'OL', leadsOhm: 0.1, nominalOhm: 4700, tolerancePct: 5 })).toMatchObject({
      verdict: 'open',
      netOhm: null,
      inRightRange: false,
    });
  });

  it('judges a 4.7 kΩ ±5 % part reading 4.52 kΩ within (−3.83 %) and 4.3 kΩ outside (IEC 60062 tolerance, from memory)', () => {
    expect(judgeResistance({ reading: 4520, nominalOhm: 4700, tolerancePct: 5 })).toMatchObject({
      verdict: 'within',
      deviationPct: -3.83,
    });
    expect(judgeResistance({ reading: 4300, nominalOhm: 4700, tolerancePct: 5 }).verdict).toBe('outside');
  });

  it('takes a reading at or below the leads as a short, and refuses a 0 Ω nominal', () => {
    expect(netResistance(0.08, 0.1)).toBe(0);
    expect(judgeResistance({ reading: 0.1, leadsOhm: 0.1, nominalOhm: 10, tolerancePct: 5 }).message).toContain(
      'a short',
    );
    expect(() => judgeResistance({ reading: 0.1, nominalOhm: 0, tolerancePct: 5 })).toThrow(/0 Ω link/);
  });
});

describe('transistor substitution (common practice, no published source)', () => {
  const original: TransistorSpec = { type: 'NPN', vMaxV: 400, iMaxA: 4, ptotW: 75, package: 'TO-220', pinout: 'BCE' };

  it('accepts an NPN 450 V / 5 A / 80 W in TO-220 with the same pin-out for an NPN 400 V / 4 A / 75 W / TO-220', () => {
    expect(
      checkSubstitution(original, { type: 'NPN', vMaxV: 450, iMaxA: 5, ptotW: 80, package: 'TO-220', pinout: 'BCE' }),
    ).toMatchObject({ verdict: 'accept', refusals: [], warnings: [] });
  });

  it('refuses a PNP, and an NPN rated 300 V', () => {
    const pnp = checkSubstitution(original, {
      type: 'PNP',
      vMaxV: 450,
      iMaxA: 5,
      ptotW: 80,
      package: 'TO-220',
      pinout: 'BCE',
    });
    expect(pnp.verdict).toBe('refuse');
    expect(pnp.refusals[0]).toContain('Opposite polarity');
    const low = checkSubstitution(original, {
      type: 'NPN',
      vMaxV: 300,
      iMaxA: 5,
      ptotW: 80,
      package: 'TO-220',
      pinout: 'BCE',
    });
    expect(low.verdict).toBe('refuse');
    expect(low.refusals).toEqual(["Vceo 300 V is below the original's 400 V."]);
  });

  it('accepts the same ratings in TO-3P with a warning about size and pin-out', () => {
    const r = checkSubstitution(original, { ...original, package: 'TO-3P' });
    expect(r.verdict).toBe('accept-with-warnings');
    expect(r.warnings.join(' ')).toMatch(/Larger package.*fits the space.*pin-out/s);
  });

  it('accepts a 400 V NPN of higher current in TO-220 for a 400 V 1.5 A NPN switching transistor in TO-126, with a warning about size and fit', () => {
    const r = checkSubstitution(
      { type: 'NPN', vMaxV: 400, iMaxA: 1.5, ptotW: 20, package: 'TO-126' },
      { type: 'NPN', vMaxV: 400, iMaxA: 4, ptotW: 75, package: 'TO-220' },
    );
    expect(r.verdict).toBe('accept-with-warnings');
    expect(r.refusals).toEqual([]);
    expect(r.warnings[0]).toMatch(/Larger package \(TO-220 for TO-126\): check it fits the space and the heatsink/);
  });

  it('warns on a different pin-out, a live tab where the original was insulated, and lower gain; refuses lower current or power', () => {
    const r = checkSubstitution(
      { ...original, package: 'TO-220F', pinout: 'BCE', hfeMin: 20 },
      { ...original, package: 'TO-220', pinout: 'ECB', hfeMin: 10 },
    );
    expect(r.verdict).toBe('accept-with-warnings');
    expect(r.warnings.join(' ')).toMatch(/insulating pad.*Different pin-out \(ECB for BCE\).*Lower gain/s);
    expect(checkSubstitution(original, { ...original, iMaxA: 3, ptotW: 50 }).refusals).toHaveLength(2);
  });

  it('checks MOSFETs the same way: channel, Vds, Id, Ptot, gate threshold; and refuses a surface-mount part for a through-hole one', () => {
    const fet: TransistorSpec = {
      type: 'N-MOSFET',
      vMaxV: 600,
      iMaxA: 8,
      ptotW: 125,
      package: 'TO-220',
      pinout: 'GDS',
      vgsThMaxV: 4,
    };
    expect(checkSubstitution(fet, { ...fet, vMaxV: 650, iMaxA: 10 }).verdict).toBe('accept');
    expect(checkSubstitution(fet, { ...fet, type: 'P-MOSFET' }).verdict).toBe('refuse');
    expect(checkSubstitution(fet, { ...fet, type: 'NPN', pinout: 'BCE' }).refusals[0]).toContain('gate voltage');
    expect(checkSubstitution(fet, { ...fet, vgsThMaxV: 5 }).warnings[0]).toContain('Higher gate threshold');
    expect(checkSubstitution(fet, { ...fet, vMaxV: 500 }).refusals).toEqual([
      "Vds 500 V is below the original's 600 V.",
    ]);
    expect(checkSubstitution(fet, { ...fet, package: 'D2PAK' }).refusals[0]).toContain('does not fit the board');
  });

  it('refuses a spec with impossible ratings', () => {
    expect(() => checkSubstitution(original, { ...original, vMaxV: 0 })).toThrow(RangeError);
    expect(() => checkSubstitution(original, { ...original, pinout: 'GDS' })).toThrow(/B, C and E/);
  });
});

describe('diode test of a bipolar transistor (common practice, no published source)', () => {
  // Keys: red probe first, black second ("BE" = red on base, black on emitter).
  const goodNpn: DiodeReadings = { BE: 0.65, EB: 'OL', BC: 0.62, CB: 'OL', CE: 'OL', EC: 'OL' };

  it('calls an NPN good when BE and BC conduct one way at about 0.5–0.7 V and CE is open both ways', () => {
    expect(interpretDiodeTest(goodNpn)).toMatchObject({ verdict: 'good', polarity: 'NPN' });
  });

  it('finds a PNP from the direction the junctions conduct', () => {
    expect(interpretDiodeTest({ BE: 'OL', EB: 0.66, BC: 'OL', CB: 0.63, CE: 'OL', EC: 'OL' })).toMatchObject({
      verdict: 'good',
      polarity: 'PNP',
    });
  });

  it('calls a transistor whose base–collector junction reads short both ways failed', () => {
    const r = interpretDiodeTest({ BE: 0.66, EB: 'OL', BC: 0.002, CB: 0.003, CE: 0.66, EC: 'OL' });
    expect(r.verdict).toBe('failed');
    expect(r.reasons[0]).toContain('base–collector pair reads short both ways');
  });

  it('calls a short both ways between collector and emitter, or an open junction, failed', () => {
    expect(interpretDiodeTest({ ...goodNpn, CE: 0.01, EC: 0.01 }).verdict).toBe('failed');
    expect(interpretDiodeTest({ ...goodNpn, BE: 'OL' }).reasons[0]).toContain('open both ways');
  });

  it('leaves odd readings unclear rather than guessing: a damper diode across C–E, or a Darlington-high base–emitter', () => {
    expect(interpretDiodeTest({ ...goodNpn, EC: 0.5 })).toMatchObject({ verdict: 'unclear', polarity: 'NPN' });
    expect(interpretDiodeTest({ ...goodNpn, CE: 0.5 }).verdict).toBe('failed');
    expect(interpretDiodeTest({ ...goodNpn, BE: 1.2 }).reasons[0]).toContain('Darlington');
    expect(interpretDiodeTest({ ...goodNpn, BC: 'OL', CB: 0.6 }).verdict).toBe('unclear');
  });
});

describe('protective conductor limit from cord length, through shared/safety/limits (EN 50678 / EN 50699, secondary)', () => {
  it.each([
    [5, 0.3],
    [12.5, 0.4],
    [20, 0.5],
    [65, 1.0],
  ])('%s m of cord → %s Ω', (m, ohm) => expect(protectiveConductorLimitOhm(m)).toBe(ohm));
});

describe('meter readings as the display shows them (common practice, no published source)', () => {
  it('reads 1k, 4.71k, 4K7, 1.2M and 0,47 Ω; refuses nonsense', async () => {
    const { parseReading } = await import('../../shared/calculators/measure');
    expect(parseReading('1k')).toBe(1000);
    expect(parseReading('4.71k')).toBeCloseTo(4710, 9);
    expect(parseReading('4K7')).toBeCloseTo(4700, 9);
    expect(parseReading('1.2M')).toBeCloseTo(1.2e6, 3);
    expect(parseReading('0,47 Ω')).toBeCloseTo(0.47, 9);
    expect(parseReading('OL')).toBe('OL');
    expect(parseReading('1.2.3')).toBeNull();
    expect(parseReading('4.7K7')).toBeNull();
  });
});
