/**
 * The Specbench verdict engine (DESIGN.md §3): pure functions shared by client and server.
 *
 * Arithmetic: every operation on typed values — unit conversion, lead and series subtraction,
 * and every comparison with a limit, limit ± U or near-limit band edge — is exact decimal
 * arithmetic with decimal.js (lib/units/exact.ts, ./corrections, ./decision), so a reading typed
 * on a limit is judged as its digits say. Uncertainties and p_c are floating point (they are
 * estimates); the temperature ratio is rounded at 60 digits. Display keeps the reading's own
 * precision (VerdictResult.valueText).
 */
export { evaluateReading } from './evaluate';
export { VerdictInputError } from './types';
export type {
  MeterAccuracy,
  QualitativeResult,
  Quantity,
  Reading,
  SpecLimits,
  Verdict,
  VerdictInput,
  VerdictResult,
  VerdictStep,
  VerdictZones,
} from './types';
export { conformanceProbability, erf, erfc, normalCdf } from './probability';
export { COVERAGE_FACTOR, meterHalfWidth, rectangularStd, rootSumSquare } from './uncertainty';
export { COPPER_INFERRED_ZERO_C, DEFAULT_REF_TEMP_C, copperFactor, referToTemperature } from './temperature';
export { DEFAULT_NEAR_LIMIT_PCT } from './spec';
export {
  MEASUREMENT_MODES,
  MODE_KIND,
  MODE_WORDS,
  isMeasurementMode,
  modeForKind,
  modeInstruction,
  readingLabel,
} from './modes';
export type { MeasurementMode } from './modes';
export { decideWithUncertainty, decideWithoutUncertainty, nearBands } from './decision';
export type { BandRule, Decision, Exact, LimitsLike, NearBands, Side, Zone } from './decision';
export { checkText, checkValue, evaluateCheck, evaluateContinuity, evaluateDiode } from './qualitative';
export type { BeepCheck, ContinuityTest, DiodeState, DiodeTest } from './qualitative';
export { REST_NOTE, SOC_TABLES, batteryStateOfCharge } from './battery';
export type { BatteryType, StateOfCharge } from './battery';
