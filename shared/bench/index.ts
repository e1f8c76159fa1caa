/**
 * The fixer's bench calculators: pure functions, no I/O. Re-exported for the server and tests; client code
 * imports the module it needs directly, so Vite's tree-shaking is not defeated by this file.
 */
export * from './resistors';
export * from './e-series';
export * from './mains';
export * from './capacitors';
export * from './measure';
export * from './transistors';
// The protective-conductor limit belongs to the safety check; re-exported, not duplicated.
export { protectiveConductorLimitOhm, cordResistanceLimitOhm, SAFETY_SOURCE } from '../safety/limits';
