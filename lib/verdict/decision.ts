/**
 * The decision rule (DESIGN.md §3.5).
 *
 * With U known: ILAC-G8:09/2019 §4.2.3 with guard band w = U. At an upper limit T:
 * pass for x < T − U; conditional pass for T − U ≤ x ≤ T; conditional fail for T < x ≤ T + U;
 * fail for x > T + U; the mirror image at a lower limit. Both conditional zones are
 * Specbench's *marginal*. The zone edges are closed on the marginal side, as in ILAC:
 * a reading exactly at T − U (its interval touching the limit) is marginal, a reading
 * exactly at T + U is marginal, and so a reading equal to a limit is never a pass.
 *
 * With U unknown: pass inside the limits (limits included), fail outside, marginal inside
 * but within the near-limit band of a limit (band edge included, so a reading on a limit is
 * marginal). The band is nearLimitPct of the tolerance width (max − min) for a two-sided spec;
 * a one-sided spec has no width, so it is nearLimitPct of the limit's own magnitude.
 */
import type { Limits } from './spec';
import type { Verdict } from './types';

export type Side = 'lower' | 'upper' | 'both';
export type Zone = 'pass' | 'conditional-pass' | 'conditional-fail' | 'fail';
export type Decision = { verdict: Verdict; zone: Zone; side?: Side };
export type NearBands = { lower?: number; upper?: number };

const ZONE_VERDICT: Record<Zone, Verdict> = {
  pass: 'pass',
  'conditional-pass': 'marginal',
  'conditional-fail': 'marginal',
  fail: 'fail',
};

const decision = (zone: Zone, side?: Side): Decision => ({ verdict: ZONE_VERDICT[zone], zone, side });

function sideOf(nearLower: boolean, nearUpper: boolean): Side {
  if (nearLower && nearUpper) return 'both';
  return nearUpper ? 'upper' : 'lower';
}

export function decideWithUncertainty(x: number, U: number, { lower, upper }: Limits): Decision {
  if (upper !== undefined && x > upper) return decision(x > upper + U ? 'fail' : 'conditional-fail', 'upper');
  if (lower !== undefined && x < lower) return decision(x < lower - U ? 'fail' : 'conditional-fail', 'lower');
  const nearUpper = upper !== undefined && x >= upper - U;
  const nearLower = lower !== undefined && x <= lower + U;
  if (nearUpper || nearLower) return decision('conditional-pass', sideOf(nearLower, nearUpper));
  return decision('pass');
}

export function nearBands({ lower, upper }: Limits, nearLimitPct: number): NearBands {
  const share = nearLimitPct / 100;
  if (lower !== undefined && upper !== undefined) {
    const band = share * (upper - lower);
    return { lower: band, upper: band };
  }
  return {
    lower: lower === undefined ? undefined : share * Math.abs(lower),
    upper: upper === undefined ? undefined : share * Math.abs(upper),
  };
}

export function decideWithoutUncertainty(x: number, { lower, upper }: Limits, bands: NearBands): Decision {
  if (upper !== undefined && x > upper) return decision('fail', 'upper');
  if (lower !== undefined && x < lower) return decision('fail', 'lower');
  const nearUpper = upper !== undefined && upper - x <= (bands.upper ?? 0);
  const nearLower = lower !== undefined && x - lower <= (bands.lower ?? 0);
  if (nearUpper || nearLower) return decision('conditional-pass', sideOf(nearLower, nearUpper));
  return decision('pass');
}
