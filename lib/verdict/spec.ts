/**
 * Checks a spec and puts it in the form the engine works with. A spec needs a min or a max:
 * a nominal alone gives no tolerance to judge against, and inventing one (say ±10 %) would
 * present a guess as a published limit, so it is an error on 'spec'. The limits are kept both
 * as numbers (for the picture) and as exact decimals (for every comparison).
 */
import { Dec, formatQuantity, type CanonicalUnit, type QuantityKind } from '../units';
import { isMeasurementMode, modeForKind, MODE_KIND, MODE_WORDS, type MeasurementMode } from './modes';
import { DEFAULT_REF_TEMP_C } from './temperature';
import { VerdictInputError, type SpecLimits } from './types';
import { optionalFinite, requireTemperature, requireUnit } from './validate';

/** Two-sided specs: the near-limit band is this % of the tolerance width unless the spec says otherwise. */
export const DEFAULT_NEAR_LIMIT_PCT = 5;
const MAX_NEAR_LIMIT_PCT = 50;
const MAX_ENGINE_RPM = 30000;

export type Limits = { lower?: number; upper?: number };
export type ExactLimits = { lower?: Dec; upper?: Dec };

export type CheckedSpec = Limits & {
  exact: ExactLimits;
  nominal?: number;
  unit: CanonicalUnit;
  kind: QuantityKind;
  refTempC: number;
  copper: boolean;
  /** As stated by the spec (undefined when it states none). */
  nearLimitPct?: number;
  nearLimit?: number;
  mode: MeasurementMode | null;
  engineRpm?: number;
};

function checkMaterial(material: unknown, kind: QuantityKind): boolean {
  if (material === null || material === undefined || material === 'none') return false;
  if (material !== 'copper') throw new VerdictInputError('spec.material', `spec.material must be 'copper' or 'none'`);
  if (kind !== 'resistance') {
    throw new VerdictInputError('spec.material', 'A copper temperature correction only applies to a resistance spec');
  }
  return true;
}

function checkNearLimit(spec: SpecLimits): Pick<CheckedSpec, 'nearLimitPct' | 'nearLimit'> {
  const pct = optionalFinite(spec.nearLimitPct, 'spec.nearLimitPct');
  if (pct !== undefined && (pct < 0 || pct > MAX_NEAR_LIMIT_PCT)) {
    throw new VerdictInputError('spec.nearLimitPct', `spec.nearLimitPct must be within 0…${MAX_NEAR_LIMIT_PCT} %`);
  }
  const abs = optionalFinite(spec.nearLimit, 'spec.nearLimit');
  if (abs !== undefined && abs < 0)
    throw new VerdictInputError('spec.nearLimit', 'spec.nearLimit must not be negative');
  return { nearLimitPct: pct, nearLimit: abs };
}

function checkMode(mode: unknown, kind: QuantityKind, unit: CanonicalUnit): MeasurementMode | null {
  if (mode === null || mode === undefined) return modeForKind(kind);
  if (!isMeasurementMode(mode)) throw new VerdictInputError('spec.mode', `spec.mode: unknown mode '${String(mode)}'`);
  if (MODE_KIND[mode] !== kind) {
    throw new VerdictInputError('spec.mode', `A meter on ${MODE_WORDS[mode]} does not read ${kind} (${unit})`);
  }
  return mode;
}

function checkRpm(value: unknown): number | undefined {
  const rpm = optionalFinite(value, 'spec.engineRpm');
  if (rpm !== undefined && (rpm < 0 || rpm > MAX_ENGINE_RPM)) {
    throw new VerdictInputError('spec.engineRpm', `spec.engineRpm must be within 0…${MAX_ENGINE_RPM} rpm`);
  }
  return rpm;
}

export function checkSpec(spec: SpecLimits | null | undefined): CheckedSpec {
  if (!spec || typeof spec !== 'object') throw new VerdictInputError('spec', 'spec is required');
  const { unit, kind } = requireUnit(spec.unit, 'spec.unit');
  const lower = optionalFinite(spec.min, 'spec.min');
  const upper = optionalFinite(spec.max, 'spec.max');
  const nominal = optionalFinite(spec.nominal, 'spec.nominal');
  if (lower === undefined && upper === undefined) {
    throw new VerdictInputError(
      'spec',
      'The spec needs a minimum or a maximum to judge a reading against (a nominal alone has no tolerance).',
    );
  }
  const exact: ExactLimits = {
    lower: lower === undefined ? undefined : new Dec(lower),
    upper: upper === undefined ? undefined : new Dec(upper),
  };
  if (exact.lower && exact.upper && exact.lower.gt(exact.upper)) {
    throw new VerdictInputError(
      'spec.min',
      `The minimum (${formatQuantity(lower!, unit)}) is above the maximum (${formatQuantity(upper!, unit)}): check the limits.`,
    );
  }
  const refTempC =
    spec.refTempC === null || spec.refTempC === undefined
      ? DEFAULT_REF_TEMP_C
      : requireTemperature(spec.refTempC, 'spec.refTempC');
  return {
    lower,
    upper,
    exact,
    nominal,
    unit,
    kind,
    refTempC,
    copper: checkMaterial(spec.material, kind),
    ...checkNearLimit(spec),
    mode: checkMode(spec.mode, kind, unit),
    engineRpm: checkRpm(spec.engineRpm),
  };
}
