/** Kinds of salvaged part a group keeps in its boxes. */
export const PART_TYPES = [
  'resistor',
  'capacitor',
  'diode',
  'bipolar-transistor',
  'mosfet',
  'fuse',
  'thermal-cutout',
  'motor',
  'switch',
  'power-supply',
  'cable',
  'other',
] as const;
export type PartType = (typeof PART_TYPES)[number];
export const PART_TYPE_LABELS: Record<PartType, string> = {
  resistor: 'Resistor',
  capacitor: 'Capacitor',
  diode: 'Diode',
  'bipolar-transistor': 'Bipolar transistor',
  mosfet: 'MOSFET',
  fuse: 'Fuse',
  'thermal-cutout': 'Thermal cut-out',
  motor: 'Motor',
  switch: 'Switch',
  'power-supply': 'Power supply',
  cable: 'Cable',
  other: 'Other',
};

/** Ratings as a fixer reads them off a part; all optional, each in SI units. */
export interface PartRatings {
  /** NPN / PNP for bipolar transistors, N / P channel for MOSFETs. */
  polarity?: 'NPN' | 'PNP' | 'N' | 'P';
  voltageV?: number;
  currentA?: number;
  powerW?: number;
  resistanceOhm?: number;
  capacitanceF?: number;
  /** Trip temperature of a thermal cut-out. */
  temperatureC?: number;
  tolerancePct?: number;
}
