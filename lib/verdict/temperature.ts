/**
 * Copper winding resistance against temperature, in the inferred-zero form of
 * NBS Handbook 100 (1966) Part I §1.1: copper's resistance extrapolates to zero at
 * −234.5 °C, so R₂ = R₁·(234.5 + T₂)/(234.5 + T₁).
 */

export const COPPER_INFERRED_ZERO_C = 234.5;
export const DEFAULT_REF_TEMP_C = 20;

/** The factor that refers a resistance read at tFrom to tTo. */
export function copperFactor(tFrom: number, tTo: number): number {
  if (!Number.isFinite(tFrom) || !Number.isFinite(tTo)) throw new RangeError('temperatures must be finite');
  if (tFrom <= -COPPER_INFERRED_ZERO_C || tTo <= -COPPER_INFERRED_ZERO_C) {
    throw new RangeError(`temperatures must be above −${COPPER_INFERRED_ZERO_C} °C`);
  }
  return (COPPER_INFERRED_ZERO_C + tTo) / (COPPER_INFERRED_ZERO_C + tFrom);
}

/** A copper resistance r read at tFrom (°C), referred to tTo (°C). */
export function referToTemperature(r: number, tFrom: number, tTo: number): number {
  return r * copperFactor(tFrom, tTo);
}
