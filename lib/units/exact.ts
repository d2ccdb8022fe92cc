/**
 * Exact decimal conversion. A typed number is a decimal ('1.01346', '0.4'), and the trade reads
 * it as one, so conversions are done in decimal.js on the number's shortest decimal form (the
 * digits that were typed) rather than in binary floating point.
 *
 * The factors come from convert-units' own definitions as configured in ./measures (a unit's
 * `to_anchor`, either a number such as 1e-3 or a fraction such as 1/12, and the ratio between
 * systems, 381/1250 ft per metre). Each factor is kept as an exact fraction of two decimals and
 * the value is divided once, at the end, with 60 significant digits: the quotient of a typed
 * decimal by an exact fraction whose result terminates (every conversion between Ω/kΩ/MΩ,
 * V/mV, A/mA, and mm/in/thou, since 1 in = 25.4 mm exactly, NIST SP 811 App. B) is therefore
 * exact, and converting a typed decimal there and back gives the typed decimal.
 */
import { Decimal } from 'decimal.js';
import type { Measure, Unit } from 'convert-units';
import { unitKind, type CanonicalUnit, type QuantityKind } from './kinds';
import { current, length, resistance, voltage } from './measures';

/** decimal.js configured for the engine: 60 significant digits, ties to even. */
export const Dec = Decimal.clone({ precision: 60, rounding: Decimal.ROUND_HALF_EVEN, toExpNeg: -30, toExpPos: 40 });
export type Dec = InstanceType<typeof Dec>;

type Ratio = { num: Dec; den: Dec };
type Anchor = number | { numerator: number; denominator: number };

const MEASURES: Record<QuantityKind, Measure<string, string>> = {
  resistance: resistance as Measure<string, string>,
  voltage: voltage as Measure<string, string>,
  current: current as Measure<string, string>,
  length,
};

function ratioOf(anchor: Anchor): Ratio {
  if (typeof anchor === 'number') return { num: new Dec(anchor), den: new Dec(1) };
  return { num: new Dec(anchor.numerator), den: new Dec(anchor.denominator) };
}

function locate(unit: CanonicalUnit): { system: string; ratio: Ratio; measure: Measure<string, string> } {
  const measure = MEASURES[unitKind(unit)];
  for (const [system, units] of Object.entries(measure.systems)) {
    const def = (units as Record<string, Unit>)[unit];
    if (def) return { system, ratio: ratioOf(def.to_anchor as Anchor), measure };
  }
  throw new TypeError(`No definition for '${unit}'`);
}

/** The exact factor from → to, as a fraction. */
function factor(from: CanonicalUnit, to: CanonicalUnit): Ratio {
  const a = locate(from);
  const b = locate(to);
  let num = a.ratio.num.times(b.ratio.den);
  let den = a.ratio.den.times(b.ratio.num);
  if (a.system !== b.system) {
    const link = a.measure.anchors?.[a.system]?.[b.system] as { ratio: Anchor } | undefined;
    if (!link) throw new TypeError(`No anchor from ${a.system} to ${b.system}`);
    const r = ratioOf(link.ratio);
    num = num.times(r.num);
    den = den.times(r.den);
  }
  return { num, den };
}

/** A typed number (or an exact decimal) in `from`, exactly in `to`. Same kind assumed (checked by the caller). */
export function convertExact(value: Decimal.Value, from: CanonicalUnit, to: CanonicalUnit): Dec {
  const v = new Dec(value);
  if (from === to) return v;
  const { num, den } = factor(from, to);
  return v.times(num).div(den);
}

/** The digits after the decimal point of a number as it reads ('88.57' → 2, '16.3' → 1, '12' → 0). */
export function decimalsOf(value: Decimal.Value): number {
  return Math.max(0, new Dec(value).decimalPlaces());
}

/**
 * An exact result shown with the precision the inputs carried: at least `minDecimals` places
 * (88.57 − 0.17 shows as 88.40), never more than `maxSignificant` figures (a temperature
 * correction, which does not terminate, is rounded there).
 */
export function formatExact(value: Dec, minDecimals = 0, maxSignificant = 7): string {
  if (value.isZero()) return minDecimals > 0 ? (0).toFixed(Math.min(minDecimals, 12)) : '0';
  const rounded = value.toSignificantDigits(maxSignificant);
  const places = Math.min(Math.max(rounded.decimalPlaces(), minDecimals), 12);
  return rounded.toFixed(places);
}
