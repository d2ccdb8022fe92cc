/**
 * Units for Specbench readings and specs: the canonical units, parsing what people type,
 * exact conversion (through convert-units, extended in ./measures) and display formatting.
 */
import { unitKind, type CanonicalUnit } from './kinds';
import { convertUnits } from './measures';

export { CANONICAL_UNITS, isCanonicalUnit, parseUnit, unitKind, unitsOfKind } from './kinds';
export type { CanonicalUnit, QuantityKind } from './kinds';
export { formatNumber, formatQuantity, formatRange } from './format';

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

/** Converts between two units of one kind with the exact factors; NaN stays NaN. */
export function convert(value: number, from: CanonicalUnit, to: CanonicalUnit): number {
  if (unitKind(from) !== unitKind(to)) throw new UnitMismatchError(from, to);
  if (from === to || Number.isNaN(value)) return value;
  return convertUnits(value).from(from).to(to) as number;
}
