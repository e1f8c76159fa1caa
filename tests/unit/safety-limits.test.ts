import { describe, expect, it } from 'vitest';
import {
  cordResistanceLimitOhm,
  insulationLimitMOhm,
  judgeSafety,
  protectiveConductorLimitOhm,
  protectiveCurrentLimitMA,
  TOUCH_CURRENT_LIMIT_MA,
} from '../../shared/safety/limits';

// Source of every limit here: EN 50678 / EN 50699 as given in test-instrument manuals — a secondary source,
// collected in the project's reference notes, section 3. Only exact multiples of 7.5 m are checked, as advised there.
describe('protective conductor resistance limit from cord length (EN 50678, secondary)', () => {
  it.each([
    [5, 0.3],
    [12.5, 0.4],
    [20, 0.5],
    [65, 1.0],
  ])('%s m of cord → %s Ω', (m, ohm) => expect(protectiveConductorLimitOhm(m)).toBe(ohm));
  it('never goes above 1.0 Ω and refuses a negative length', () => {
    expect(protectiveConductorLimitOhm(200)).toBe(1.0);
    expect(() => protectiveConductorLimitOhm(-1)).toThrow(RangeError);
  });
});

describe('insulation, protective current and touch current limits (EN 50678, secondary)', () => {
  it('gives the insulation minimum per class at 500 V DC', () => {
    expect([
      insulationLimitMOhm('I'),
      insulationLimitMOhm('I', true),
      insulationLimitMOhm('II'),
      insulationLimitMOhm('III'),
    ]).toEqual([1.0, 0.3, 2.0, 0.25]);
  });
  it('allows 3.5 mA protective conductor current, 1 mA per kW above 3.5 kW of heating, at most 10 mA', () => {
    expect([
      protectiveCurrentLimitMA(),
      protectiveCurrentLimitMA(3),
      protectiveCurrentLimitMA(6),
      protectiveCurrentLimitMA(12),
    ]).toEqual([3.5, 3.5, 6, 10]);
    expect(TOUCH_CURRENT_LIMIT_MA).toBe(0.5);
  });
});

describe('judging a safety check', () => {
  it('passes a class I kettle with readings inside every limit', () => {
    expect(
      judgeSafety({
        visualOk: true,
        applianceClass: 'I',
        cordLengthM: 5,
        protectiveConductorOhm: 0.12,
        insulationMOhm: 50,
        heating: true,
      }),
    ).toEqual({ pass: true, failures: [], missing: [] });
  });
  it('fails a protective conductor over its limit and says why', () => {
    const v = judgeSafety({
      visualOk: true,
      applianceClass: 'I',
      cordLengthM: 5,
      protectiveConductorOhm: 0.45,
      insulationMOhm: 50,
    });
    expect(v.pass).toBe(false);
    expect(v.failures[0]).toContain('0.45 Ω is above the 0.3 Ω limit');
  });
  it('fails a visual fault whatever the readings, and a class II item below 2 MΩ', () => {
    expect(judgeSafety({ visualOk: false, applianceClass: 'II', insulationMOhm: 100 }).pass).toBe(false);
    expect(judgeSafety({ visualOk: true, applianceClass: 'II', insulationMOhm: 1.5 }).failures[0]).toContain(
      'below the 2 MΩ minimum',
    );
  });
  it('does not pass a check with a reading missing', () => {
    expect(judgeSafety({ visualOk: true, applianceClass: 'I', insulationMOhm: 10 })).toMatchObject({
      pass: false,
      missing: ['cord length', 'protective conductor resistance'],
    });
  });
});

describe('the UK-style limit: 0.1 Ω plus the cord (IET code of practice, from memory)', () => {
  it('gives 0.139 Ω for 2 m of 1.0 mm² cord at 19.5 mΩ/m (cord resistance from memory)', () => {
    expect(cordResistanceLimitOhm(2)).toBe(0.139);
  });
});
