import { refuse } from '../calculators/said';
import { missingReadings, type ApplianceClass } from './readings';

/**
 * Limits for the electrical safety check of a portable mains appliance after repair. Values as given by
 * test-instrument manuals for EN 50678 / EN 50699 (a secondary source); local codes and a competent person's
 * judgement prevail over this table.
 */
export type { ApplianceClass } from './readings';

export const SAFETY_SOURCE = 'EN 50678 / EN 50699 limits as given in test-instrument manuals (secondary source)';

/** Protective conductor resistance, Class I: 0.3 Ω up to 5 m of cord, +0.1 Ω for each further 7.5 m begun, at most 1.0 Ω. */
export function protectiveConductorLimitOhm(cordLengthM: number): number {
  if (!(cordLengthM >= 0)) throw refuse('calc.el.cord');
  const extra = Math.max(0, Math.ceil((cordLengthM - 5) / 7.5 - 1e-9));
  return Math.min(1.0, Math.round((0.3 + 0.1 * extra) * 1000) / 1000);
}

/** Insulation resistance at 500 V DC, in MΩ. */
export function insulationLimitMOhm(cls: ApplianceClass, heating = false): number {
  if (cls === 'I') return heating ? 0.3 : 1.0;
  return cls === 'II' ? 2.0 : 0.25;
}

/** Protective conductor current, mA: 3.5 mA; heating appliances above 3.5 kW 1 mA per kW, at most 10 mA. */
export function protectiveCurrentLimitMA(heatingKw = 0): number {
  return heatingKw > 3.5 ? Math.min(10, heatingKw) : 3.5;
}

export const TOUCH_CURRENT_LIMIT_MA = 0.5;

export interface SafetyReadings {
  visualOk: boolean;
  applianceClass: ApplianceClass;
  cordLengthM?: number;
  protectiveConductorOhm?: number;
  insulationMOhm?: number;
  heating?: boolean;
  heatingKw?: number;
  protectiveCurrentMA?: number;
  touchCurrentMA?: number;
}

export interface SafetyVerdict {
  pass: boolean;
  failures: string[];
  missing: string[];
}

/** Stable codes for what a check found, so a page can tell the visual fault from a reading without reading words. */
export const SAFETY_FAULTS = {
  visual: 'visual-fault',
  protectiveConductor: 'protective-conductor-high',
  insulation: 'insulation-low',
  protectiveCurrent: 'protective-current-high',
  touchCurrent: 'touch-current-high',
} as const;
export type SafetyFaultCode = (typeof SAFETY_FAULTS)[keyof typeof SAFETY_FAULTS];
export interface SafetyFault {
  code: SafetyFaultCode;
  /** The form field at fault ('visual' for the inspection). */
  field: 'visual' | 'protectiveConductorOhm' | 'insulationMOhm' | 'protectiveCurrentMA' | 'touchCurrentMA';
  message: string;
  /** The figures in the message (reading, limit, cord, class), for a translation to put in its own place. */
  values: Record<string, number | string>;
}

/** Every reading given that is outside its limit, and the visual inspection if it found a fault. */
export function safetyFaults(r: SafetyReadings): SafetyFault[] {
  const faults: SafetyFault[] = [];
  if (!r.visualOk)
    faults.push({
      code: SAFETY_FAULTS.visual,
      field: 'visual',
      message: 'The visual inspection found a fault (cord, plug, strain relief, casing or signs of heat).',
      values: {},
    });
  if (r.applianceClass === 'I' && r.protectiveConductorOhm !== undefined && r.cordLengthM !== undefined) {
    const limit = protectiveConductorLimitOhm(r.cordLengthM);
    if (r.protectiveConductorOhm > limit)
      faults.push({
        code: SAFETY_FAULTS.protectiveConductor,
        field: 'protectiveConductorOhm',
        message: `Protective conductor ${r.protectiveConductorOhm} Ω is above the ${limit} Ω limit for ${r.cordLengthM} m of cord.`,
        values: { reading: r.protectiveConductorOhm, limit, cord: r.cordLengthM },
      });
  }
  if (r.insulationMOhm !== undefined) {
    const limit = insulationLimitMOhm(r.applianceClass, r.heating);
    if (r.insulationMOhm < limit)
      faults.push({
        code: SAFETY_FAULTS.insulation,
        field: 'insulationMOhm',
        message: `Insulation ${r.insulationMOhm} MΩ is below the ${limit} MΩ minimum for class ${r.applianceClass}${r.heating ? ' with heating elements' : ''}.`,
        values: { reading: r.insulationMOhm, limit, cls: r.applianceClass },
      });
  }
  if (r.protectiveCurrentMA !== undefined) {
    const limit = protectiveCurrentLimitMA(r.heatingKw);
    if (r.protectiveCurrentMA > limit)
      faults.push({
        code: SAFETY_FAULTS.protectiveCurrent,
        field: 'protectiveCurrentMA',
        message: `Protective conductor current ${r.protectiveCurrentMA} mA is above ${limit} mA.`,
        values: { reading: r.protectiveCurrentMA, limit },
      });
  }
  if (r.touchCurrentMA !== undefined && r.touchCurrentMA > TOUCH_CURRENT_LIMIT_MA)
    faults.push({
      code: SAFETY_FAULTS.touchCurrent,
      field: 'touchCurrentMA',
      message: `Touch current ${r.touchCurrentMA} mA is above ${TOUCH_CURRENT_LIMIT_MA} mA.`,
      values: { reading: r.touchCurrentMA, limit: TOUCH_CURRENT_LIMIT_MA },
    });
  return faults;
}

/** Pass only when the visual inspection passed and every reading the class needs is present and within its limit. */
export function judgeSafety(r: SafetyReadings): SafetyVerdict {
  const failures = safetyFaults(r).map((f) => f.message);
  const missing = missingReadings(r).map((m) => m.name);
  return { pass: failures.length === 0 && missing.length === 0, failures, missing };
}

/**
 * The UK code of practice's way (IET in-service inspection; from memory, not checked): 0.1 Ω plus the resistance
 * of the cord's protective conductor, e.g. 19.5 mΩ per metre for 1.0 mm² cord.
 */
export const cordResistanceLimitOhm = (cordLengthM: number, milliOhmPerM = 19.5) =>
  Math.round((0.1 + (cordLengthM * milliOhmPerM) / 1000) * 1000) / 1000;
