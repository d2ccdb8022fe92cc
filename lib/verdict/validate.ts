/**
 * Input checks shared by the engine: every number finite, every unit known and of the
 * right kind. Each failure is a VerdictInputError naming the field a form would highlight.
 */
import { convert, parseUnit, type CanonicalUnit, type QuantityKind } from '../units';
import { VerdictInputError, type Quantity } from './types';

export const MIN_TEMP_C = -40;
export const MAX_TEMP_C = 200;

export function requireFinite(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new VerdictInputError(field, `${field} must be a finite number (got ${String(value)})`);
  }
  return value;
}

export function optionalFinite(value: unknown, field: string): number | undefined {
  return value === null || value === undefined ? undefined : requireFinite(value, field);
}

/** Accepts any spelling `parseUnit` knows (so the OHM SIGN works), returns the canonical unit. */
export function requireUnit(text: unknown, field: string): { unit: CanonicalUnit; kind: QuantityKind } {
  const parsed = typeof text === 'string' ? parseUnit(text) : null;
  if (!parsed) throw new VerdictInputError(field, `${field}: unknown unit '${String(text)}'`);
  return parsed;
}

/** The quantity's value in `target`, or an error on `${field}.unit` when it measures something else. */
export function valueIn(quantity: Quantity | null | undefined, field: string, target: CanonicalUnit): number {
  if (!quantity || typeof quantity !== 'object') throw new VerdictInputError(field, `${field} is required`);
  const value = requireFinite(quantity.value, `${field}.value`);
  const { unit, kind } = requireUnit(quantity.unit, `${field}.unit`);
  const targetKind = requireUnit(target, 'spec.unit').kind;
  if (kind !== targetKind) {
    throw new VerdictInputError(
      `${field}.unit`,
      `${field} is a ${kind} (${unit}) but the spec is a ${targetKind} (${target})`,
    );
  }
  return convert(value, unit, target);
}

export function requireTemperature(value: unknown, field: string): number {
  const t = requireFinite(value, field);
  if (t < MIN_TEMP_C || t > MAX_TEMP_C) {
    throw new VerdictInputError(field, `${field} ${t} °C is outside ${MIN_TEMP_C}…${MAX_TEMP_C} °C`);
  }
  return t;
}
