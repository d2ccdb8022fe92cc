/**
 * A measured step in the run's calculator: the limits it is judged against on this
 * machine (the library spec, else the plan's own limits, else none — the technician types
 * them), and the calculator's input as the step result the server judges again. Pure, so
 * the screen and the tests share it; the server judges with the same engine and limits.
 */
import type { RunStepDto, StepReading, TypedLimits } from '../contracts/plans';
import { isCanonicalUnit, unitKind, type QuantityKind } from '../units';
import { limitsOf } from '../specs/limits';
import type { SpecLimits, VerdictInput } from '../verdict';

export type StepLimits = { spec: SpecLimits; kind: QuantityKind; from: 'library' | 'plan' };

/** The plan's typed limits for a measured step, if it states any. */
export function planLimits(step: RunStepDto): TypedLimits | undefined {
  const check = step.check;
  return check.kind === 'limits' ? check.limits : check.kind === 'spec' ? check.limits : undefined;
}

/** Where the step's limits come from on this machine; null when the technician must type them. */
export function stepLimits(step: RunStepDto): StepLimits | null {
  const s = step.spec;
  if (s && isCanonicalUnit(s.unit)) {
    return {
      from: 'library',
      kind: s.quantityKind,
      spec: limitsOf({ ...s, unit: s.unit }),
    };
  }
  const typed = planLimits(step);
  return typed && isCanonicalUnit(typed.unit)
    ? { from: 'plan', kind: unitKind(typed.unit), spec: typedSpec(typed) }
    : null;
}

/** Limits typed by the plan or the technician, as the server reads them (no temperature correction). */
export function typedSpec(typed: TypedLimits): SpecLimits {
  if (!isCanonicalUnit(typed.unit)) throw new Error(`not a unit: ${typed.unit}`);
  return { min: typed.min ?? null, nominal: typed.nominal ?? null, max: typed.max ?? null, unit: typed.unit };
}

/**
 * The calculator's input as the step's result: the reading and its corrections; the
 * limits only when the technician typed them (a library spec or the plan's are the server's).
 */
export function toStepReading(input: VerdictInput, typedByHand?: TypedLimits): StepReading {
  const reading: StepReading = { value: input.reading.value, unit: input.reading.unit };
  if (input.leadResistance) reading.leadResistance = { ...input.leadResistance };
  if (input.seriesResistance) {
    const { value, unit, tolerancePct } = input.seriesResistance;
    reading.seriesResistance = tolerancePct === undefined ? { value, unit } : { value, unit, tolerancePct };
  }
  if (input.temperatureC !== undefined) reading.temperatureC = input.temperatureC;
  if (input.meter) reading.meter = { ...input.meter };
  if (typedByHand) reading.limits = { ...typedByHand };
  return reading;
}
