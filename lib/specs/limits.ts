/**
 * A spec's limits as the verdict engine takes them (lib/verdict SpecLimits), from any shape
 * that carries the spec's fields: the stored spec on the server, the spec card's DTO, a
 * plan step's spec. One place, so the card, the run and the server judge with the same.
 */
import type { Material, MeasurementMode } from '../contracts/enums';
import type { CanonicalUnit } from '../units';
import type { SpecLimits } from '../verdict';

export type LimitFields = {
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: CanonicalUnit;
  refTempC: number | null;
  material: Material;
  nearLimit: number | null;
  engineRpm: number | null;
  /** The spec's mode, or the one its parameter implies (lib/specs/classify defaultMode). */
  mode: MeasurementMode | null;
};

export function limitsOf(s: LimitFields): SpecLimits {
  return {
    min: s.min,
    nominal: s.nominal,
    max: s.max,
    unit: s.unit,
    refTempC: s.refTempC,
    material: s.material,
    nearLimit: s.nearLimit,
    mode: s.mode,
    engineRpm: s.engineRpm,
  };
}
