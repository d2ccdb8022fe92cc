/**
 * Units for Specbench readings and specs: the canonical units, parsing what people type,
 * exact conversion (through convert-units, extended in ./measures) and display formatting.
 */
import { unitKind, type CanonicalUnit } from './kinds';
import { convertExact } from './exact';

export { CANONICAL_UNITS, isCanonicalUnit, parseUnit, unitKind, unitsOfKind } from './kinds';
export type { CanonicalUnit, QuantityKind } from './kinds';
export { formatNumber, formatQuantity, formatRange } from './format';
export { Dec, convertExact, decimalsOf, formatExact } from './exact';

/** Thrown by `convert` when the two units measure different quantities (e.g. V → Ω). */
export class UnitMismatchError extends Error {
  readonly from: CanonicalUnit;
  readonly to: CanonicalUnit;

  constructor(from: CanonicalUnit, to: CanonicalUnit) {
    super(`Cannot convert ${unitKind(from)} (${from}) to ${unitKind(to)} (${to})`);
    Object.setPrototypeOf(this, new.target.prototype);
    this.name = 'UnitMismatchError';
    this.from = from;
    this.to = to;
  }
}

/**
 * Converts between two units of one kind in exact decimal arithmetic (./exact), then to the
 * nearest double: 1.01346 mm is 39.9 thou, not 39.900000000000006. NaN and ±∞ stay as they are.
 */
export function convert(value: number, from: CanonicalUnit, to: CanonicalUnit): number {
  if (unitKind(from) !== unitKind(to)) throw new UnitMismatchError(from, to);
  if (from === to || !Number.isFinite(value)) return value;
  return convertExact(value, from, to).toNumber();
}
