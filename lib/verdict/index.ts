/**
 * The Specbench verdict engine (DESIGN.md §3): pure functions shared by client and server.
 */
export { evaluateReading } from './evaluate';
export { VerdictInputError } from './types';
export type {
  MeterAccuracy,
  QualitativeResult,
  Quantity,
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
export { decideWithUncertainty, decideWithoutUncertainty, nearBands } from './decision';
export type { Decision, NearBands, Side, Zone } from './decision';
export { evaluateDiode, evaluateContinuity } from './qualitative';
export type { ContinuityTest, DiodeState, DiodeTest } from './qualitative';
export { REST_NOTE, SOC_TABLES, batteryStateOfCharge } from './battery';
export type { BatteryType, StateOfCharge } from './battery';
