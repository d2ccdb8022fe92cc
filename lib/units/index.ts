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

/** A typed value has at most 15 significant digits; a result this close to such a decimal is that decimal. */
const TYPED_DIGITS = 15;
const SNAP = 4e-16;

/**
 * Converts between two units of one kind in exact decimal arithmetic (./exact), then to a number:
 * 1.01346 mm is 39.9 thou, not 39.900000000000006. A result within 4e-16 (two rounding steps of
 * a double) of a 15-digit decimal is taken as that decimal, so converting a typed decimal there
 * and back gives the typed decimal even when the way there does not terminate (mm → in). NaN and
 * ±∞ stay as they are. The engine compares the unrounded decimals (convertExact).
 */
export function convert(value: number, from: CanonicalUnit, to: CanonicalUnit): number {
  if (unitKind(from) !== unitKind(to)) throw new UnitMismatchError(from, to);
  if (from === to || !Number.isFinite(value)) return value;
  const exact = convertExact(value, from, to);
  const short = exact.toSignificantDigits(TYPED_DIGITS);
  return short.minus(exact).abs().lte(exact.abs().times(SNAP)) ? short.toNumber() : exact.toNumber();
}
