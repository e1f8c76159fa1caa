/**
 * Limits for the electrical safety check of a portable mains appliance after repair. Values as given by
 * test-instrument manuals for EN 50678 / EN 50699 (a secondary source); local codes and a competent person's
 * judgement prevail over this table.
 */
export type ApplianceClass = 'I' | 'II' | 'III';

export const SAFETY_SOURCE = 'EN 50678 / EN 50699 limits as given in test-instrument manuals (secondary source)';

/** Protective conductor resistance, Class I: 0.3 Ω up to 5 m of cord, +0.1 Ω for each further 7.5 m begun, at most 1.0 Ω. */
export function protectiveConductorLimitOhm(cordLengthM: number): number {
  if (!(cordLengthM >= 0)) throw new RangeError('Cord length must be zero or more metres.');
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

/** Pass only when the visual inspection passed and every reading the class needs is present and within its limit. */
export function judgeSafety(r: SafetyReadings): SafetyVerdict {
  const failures: string[] = [];
  const missing: string[] = [];
  if (!r.visualOk)
    failures.push('The visual inspection found a fault (cord, plug, strain relief, casing or signs of heat).');
  if (r.applianceClass === 'I') {
    if (r.cordLengthM === undefined) missing.push('cord length');
    if (r.protectiveConductorOhm === undefined) missing.push('protective conductor resistance');
    else if (r.cordLengthM !== undefined) {
      const limit = protectiveConductorLimitOhm(r.cordLengthM);
      if (r.protectiveConductorOhm > limit)
        failures.push(
          `Protective conductor ${r.protectiveConductorOhm} Ω is above the ${limit} Ω limit for ${r.cordLengthM} m of cord.`,
        );
    }
  }
  if (r.applianceClass !== 'III' || r.insulationMOhm !== undefined) {
    if (r.insulationMOhm === undefined) missing.push('insulation resistance');
    else {
      const limit = insulationLimitMOhm(r.applianceClass, r.heating);
      if (r.insulationMOhm < limit)
        failures.push(
          `Insulation ${r.insulationMOhm} MΩ is below the ${limit} MΩ minimum for class ${r.applianceClass}${r.heating ? ' with heating elements' : ''}.`,
        );
    }
  }
  if (r.protectiveCurrentMA !== undefined) {
    const limit = protectiveCurrentLimitMA(r.heatingKw);
    if (r.protectiveCurrentMA > limit)
      failures.push(`Protective conductor current ${r.protectiveCurrentMA} mA is above ${limit} mA.`);
  }
  if (r.touchCurrentMA !== undefined && r.touchCurrentMA > TOUCH_CURRENT_LIMIT_MA)
    failures.push(`Touch current ${r.touchCurrentMA} mA is above ${TOUCH_CURRENT_LIMIT_MA} mA.`);
  return { pass: failures.length === 0 && missing.length === 0, failures, missing };
}

/**
 * The UK code of practice's way (IET in-service inspection; from memory, not checked): 0.1 Ω plus the resistance
 * of the cord's protective conductor, e.g. 19.5 mΩ per metre for 1.0 mm² cord.
 */
export const cordResistanceLimitOhm = (cordLengthM: number, milliOhmPerM = 19.5) =>
  Math.round((0.1 + (cordLengthM * milliOhmPerM) / 1000) * 1000) / 1000;
