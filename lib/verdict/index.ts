/**
 * The Specbench verdict engine (DESIGN.md §3): pure functions shared by client and server.
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
export { evaluateDiode, evaluateContinuity } from './qualitative';
export type { ContinuityTest, DiodeState, DiodeTest } from './qualitative';
export { REST_NOTE, SOC_TABLES, batteryStateOfCharge } from './battery';
export type { BatteryType, StateOfCharge } from './battery';
