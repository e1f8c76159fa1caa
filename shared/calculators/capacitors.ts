/**
 * Discharging a capacitor through a resistor: V(t) = V0·e^(−t/RC) (derived). SI units throughout — volts, ohms,
 * farads, seconds, joules; the page converts µF. Invalid input throws a CalcError (./said).
 */
import { formatOhms } from './resistors';
import { refuse, term, type Term } from './said';

export const DISCHARGE_SOURCE = 'Derived: V(t) = V0·e^(−t/RC), E = ½CV²';

export interface SafeVoltageThreshold {
  id: 'elv-dc' | 'elv-ac' | 'residual-5s' | 'plug-pins-1s' | 'plug-pins-34v';
  volts: number;
  /** How soon the standard wants the voltage down after disconnection; null for a plain limit. */
  withinS: number | null;
  label: string;
  source: string;
}

/** Extra-low voltage, ripple-free DC. */
export const ELV_DC: SafeVoltageThreshold = {
  id: 'elv-dc',
  volts: 120,
  withinS: null,
  label: 'Extra-low voltage, ripple-free DC',
  source: 'IEC 61140, read via IEC Electropedia',
};
/** Extra-low voltage, AC rms: not a limit for a charged capacitor, kept for comparison. */
export const ELV_AC: SafeVoltageThreshold = {
  id: 'elv-ac',
  volts: 50,
  withinS: null,
  label: 'Extra-low voltage, AC rms',
  source: 'IEC 61140, read via IEC Electropedia',
};
/** Residual voltage on live parts after the supply is cut. */
export const RESIDUAL_60V_5S: SafeVoltageThreshold = {
  id: 'residual-5s',
  volts: 60,
  withinS: 5,
  label: 'Residual voltage, within 5 s of disconnection',
  source: 'IEC 60204-1 6.2.4, secondary source',
};
/** The same 60 V, on accessible plug pins, within 1 s. */
export const PLUG_PINS_60V_1S: SafeVoltageThreshold = {
  id: 'plug-pins-1s',
  volts: 60,
  withinS: 1,
  label: 'Accessible plug pins, within 1 s',
  source: 'IEC 60204-1 6.2.4, secondary source',
};
/** Between the pins of an appliance's plug, 1 s after unplugging. */
export const PLUG_PINS_34V_1S: SafeVoltageThreshold = {
  id: 'plug-pins-34v',
  volts: 34,
  withinS: 1,
  label: 'Between plug pins, 1 s after unplugging',
  source: 'IEC 60335-1 22.5, secondary source',
};

/** The thresholds that apply to a charged capacitor, lowest last. */
export const DC_THRESHOLDS = [ELV_DC, RESIDUAL_60V_5S, PLUG_PINS_60V_1S, PLUG_PINS_34V_1S] as const;

/** The bench default: the lowest listed threshold, because a fixer's fingers are closer than a plug's pins. */
export const DEFAULT_TOUCH_THRESHOLD = PLUG_PINS_34V_1S;

/** What a figure is, as the refusal names it (bench.calc.term.*). */
const WHAT = {
  resistance: term('calc.term.theResistance', 'The resistance'),
  capacitance: term('calc.term.theCapacitance', 'The capacitance'),
  startingVoltage: term('calc.term.theStartingVoltage', 'The starting voltage'),
  time: term('calc.term.theTime', 'The time'),
  targetVoltage: term('calc.term.theTargetVoltage', 'The target voltage (a capacitor never quite reaches 0 V)'),
  voltage: term('calc.term.theVoltage', 'The capacitor voltage'),
  resistor: term('calc.term.theResistor', 'The discharge resistor'),
} satisfies Record<string, Term>;
const positive = (x: number, what: Term) => {
  if (!Number.isFinite(x) || x <= 0) throw refuse('calc.c.above0', { what });
};
const notNegative = (x: number, what: Term) => {
  if (!Number.isFinite(x) || x < 0) throw refuse('calc.c.zeroOrMore', { what });
};

export const timeConstantS = (rOhm: number, cFarad: number) => {
  positive(rOhm, WHAT.resistance);
  positive(cFarad, WHAT.capacitance);
  return rOhm * cFarad;
};

/** The voltage left after t seconds through R. */
export function voltageAfter(v0: number, rOhm: number, cFarad: number, tS: number): number {
  notNegative(v0, WHAT.startingVoltage);
  notNegative(tS, WHAT.time);
  return v0 * Math.exp(-tS / timeConstantS(rOhm, cFarad));
}

/** Seconds until the voltage falls to vTarget through R; 0 when it is already there. Never reaches 0 V, so vTarget > 0. */
export function timeToVoltage(v0: number, vTarget: number, rOhm: number, cFarad: number): number {
  notNegative(v0, WHAT.startingVoltage);
  positive(vTarget, WHAT.targetVoltage);
  const tau = timeConstantS(rOhm, cFarad);
  return v0 <= vTarget ? 0 : tau * Math.log(v0 / vTarget);
}

/** ½CV², in joules. */
export function storedEnergyJ(cFarad: number, volts: number): number {
  positive(cFarad, WHAT.capacitance);
  if (!Number.isFinite(volts)) throw refuse('calc.c.voltage');
  return 0.5 * cFarad * volts * volts;
}

/** The largest resistor that brings v0 down to vTarget within tS; Infinity when it is already there. */
export function maxResistanceFor(v0: number, vTarget: number, cFarad: number, tS: number): number {
  notNegative(v0, WHAT.startingVoltage);
  positive(vTarget, WHAT.targetVoltage);
  positive(cFarad, WHAT.capacitance);
  positive(tS, WHAT.time);
  return v0 <= vTarget ? Infinity : tS / (cFarad * Math.log(v0 / vTarget));
}

export interface DischargeInput {
  /** What the capacitor measures now, or what it was charged to (e.g. the rectified mains peak). */
  voltageV: number;
  capacitanceF: number;
  /** The discharge resistor, if one has been chosen. */
  resistanceOhm?: number;
  threshold?: SafeVoltageThreshold;
}

export interface DischargeAdvice {
  threshold: SafeVoltageThreshold;
  /** At or below the threshold now. Still measure before touching: this says what the numbers say, nothing more. */
  safeToTouch: boolean;
  energyJ: number;
  /** Through the given resistor: seconds to the threshold, and 5τ (under 1 % left). Null without a resistor. */
  waitS: number | null;
  fiveTauS: number | null;
  /** At the first moment of discharge, what the resistor must take: V/R and V²/R. */
  peakCurrentA: number | null;
  peakPowerW: number | null;
  /** The largest resistor that meets the threshold's time (or 5 s if it has none). */
  maxOhm: number;
  maxOhmWithinS: number;
  messages: string[];
}

const round = (x: number, dp: number) => Math.round(x * 10 ** dp) / 10 ** dp;

/** Whether a capacitor is below the chosen threshold, and how long to wait through a given resistor. */
export function dischargeAdvice({
  voltageV,
  capacitanceF,
  resistanceOhm,
  threshold = DEFAULT_TOUCH_THRESHOLD,
}: DischargeInput): DischargeAdvice {
  notNegative(voltageV, WHAT.voltage);
  positive(capacitanceF, WHAT.capacitance);
  if (resistanceOhm !== undefined) positive(resistanceOhm, WHAT.resistor);
  const safeToTouch = voltageV <= threshold.volts;
  const energyJ = storedEnergyJ(capacitanceF, voltageV);
  const withinS = threshold.withinS ?? 5;
  const maxOhm = maxResistanceFor(voltageV, threshold.volts, capacitanceF, withinS);
  const waitS =
    resistanceOhm === undefined ? null : timeToVoltage(voltageV, threshold.volts, resistanceOhm, capacitanceF);
  const fiveTauS = resistanceOhm === undefined ? null : 5 * timeConstantS(resistanceOhm, capacitanceF);
  const messages: string[] = [];
  if (safeToTouch)
    messages.push(
      `${round(voltageV, 1)} V is at or below ${threshold.volts} V (${threshold.source}). Measure again across the capacitor before you touch it.`,
    );
  else {
    messages.push(
      `${round(voltageV, 1)} V is above ${threshold.volts} V (${threshold.source}): not safe to touch. The capacitor holds ${round(energyJ, 2)} J.`,
    );
    if (waitS !== null)
      messages.push(
        `Through ${formatOhms(resistanceOhm!)} it falls to ${threshold.volts} V after ${round(waitS, 2)} s; wait at least that long — 5τ (${round(fiveTauS!, 2)} s) leaves under 1 % — then measure before touching.`,
      );
    else
      messages.push(
        `Discharge it through a resistor: ${Number.isFinite(maxOhm) ? `at most ${round(maxOhm, 0)} Ω` : 'any value'} brings it to ${threshold.volts} V within ${withinS} s. Then measure before touching.`,
      );
    if (resistanceOhm !== undefined)
      messages.push(
        `The resistor takes up to ${round((voltageV * voltageV) / resistanceOhm, 2)} W at first and must be rated for ${round(voltageV, 0)} V; never short the terminals with a screwdriver.`,
      );
  }
  return {
    threshold,
    safeToTouch,
    energyJ,
    waitS,
    fiveTauS,
    peakCurrentA: resistanceOhm === undefined ? null : voltageV / resistanceOhm,
    peakPowerW: resistanceOhm === undefined ? null : (voltageV * voltageV) / resistanceOhm,
    maxOhm,
    maxOhmWithinS: withinS,
    messages,
  };
}
