/**
 * Checks a spec and puts it in the form the engine works with. A spec needs a min or a max:
 * a nominal alone gives no tolerance to judge against, and inventing one (say ±10 %) would
 * present a guess as a published limit, so it is an error on 'spec'.
 */
import type { CanonicalUnit, QuantityKind } from '../units';
import { DEFAULT_REF_TEMP_C } from './temperature';
import { VerdictInputError, type SpecLimits } from './types';
import { optionalFinite, requireTemperature, requireUnit } from './validate';

export const DEFAULT_NEAR_LIMIT_PCT = 5;
const MAX_NEAR_LIMIT_PCT = 50;

export type Limits = { lower?: number; upper?: number };

export type CheckedSpec = Limits & {
  nominal?: number;
  unit: CanonicalUnit;
  kind: QuantityKind;
  refTempC: number;
  copper: boolean;
  nearLimitPct: number;
};

function checkMaterial(material: unknown, kind: QuantityKind): boolean {
  if (material === null || material === undefined || material === 'none') return false;
  if (material !== 'copper') throw new VerdictInputError('spec.material', `spec.material must be 'copper' or 'none'`);
  if (kind !== 'resistance') {
    throw new VerdictInputError('spec.material', 'A copper temperature correction only applies to a resistance spec');
  }
  return true;
}

function checkNearLimitPct(value: unknown): number {
  const pct = optionalFinite(value, 'spec.nearLimitPct') ?? DEFAULT_NEAR_LIMIT_PCT;
  if (pct < 0 || pct > MAX_NEAR_LIMIT_PCT) {
    throw new VerdictInputError('spec.nearLimitPct', `spec.nearLimitPct must be within 0…${MAX_NEAR_LIMIT_PCT} %`);
  }
  return pct;
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
      'The spec needs a min or a max to judge a reading against (a nominal alone has no tolerance)',
    );
  }
  if (lower !== undefined && upper !== undefined && lower > upper) {
    throw new VerdictInputError('spec.min', `spec.min ${lower} is greater than spec.max ${upper}`);
  }
  const refTempC =
    spec.refTempC === null || spec.refTempC === undefined
      ? DEFAULT_REF_TEMP_C
      : requireTemperature(spec.refTempC, 'spec.refTempC');
  return {
    lower,
    upper,
    nominal,
    unit,
    kind,
    refTempC,
    copper: checkMaterial(spec.material, kind),
    nearLimitPct: checkNearLimitPct(spec.nearLimitPct),
  };
}
