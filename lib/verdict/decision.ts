/**
 * The decision rule (DESIGN.md §3.5), in exact decimal arithmetic: every comparison of a value
 * with a limit, a limit ± U or a band edge is made in decimal.js, so a reading typed exactly on
 * a limit or a band edge is judged as the typed digits say (3.9 against 2–4 with a 0.1 band is
 * on the band's edge: marginal).
 *
 * With U known: ILAC-G8:09/2019 §4.2.3 with guard band w = U. At an upper limit T:
 * pass for x < T − U; conditional pass for T − U ≤ x ≤ T; conditional fail for T < x ≤ T + U;
 * fail for x > T + U; the mirror image at a lower limit. Both conditional zones are
 * Specbench's *marginal*. The zone edges are closed on the marginal side, as in ILAC:
 * a reading exactly at T − U (its interval touching the limit) is marginal, a reading
 * exactly at T + U is marginal, and so a reading equal to a limit is never a pass.
 *
 * With U unknown: pass inside the limits, fail outside, marginal inside but within the
 * near-limit band of a limit (band edge included). A two-sided spec's band is nearLimitPct
 * (default 5 %) of its width, or nearLimit in the spec's unit. A one-sided spec has no width,
 * so it has no band unless it states one (nearLimitPct of the limit, or nearLimit): that is
 * ILAC-G8 §4.2.1 simple acceptance, w = 0. A reading exactly on a limit is marginal either way.
 */
import { Dec } from '../units';
import { DEFAULT_NEAR_LIMIT_PCT } from './spec';
import type { Verdict } from './types';

export type Side = 'lower' | 'upper' | 'both';
export type Zone = 'pass' | 'conditional-pass' | 'conditional-fail' | 'fail';
export type Decision = { verdict: Verdict; zone: Zone; side?: Side };
/** A number as typed, or an exact decimal. */
export type Exact = number | string | Dec;
export type LimitsLike = { lower?: Exact; upper?: Exact };
/** The near-limit band at each limit (absent: no band, only a reading on the limit is marginal). */
export type NearBands = { lower?: Dec; upper?: Dec; basis: 'width' | 'limit' | 'absolute' | 'none'; pct?: number };
export type BandRule = { nearLimitPct?: number | null; nearLimit?: number | null };

const ZONE_VERDICT: Record<Zone, Verdict> = {
  pass: 'pass',
  'conditional-pass': 'marginal',
  'conditional-fail': 'marginal',
  fail: 'fail',
};

const decision = (zone: Zone, side?: Side): Decision => ({ verdict: ZONE_VERDICT[zone], zone, side });
const dec = (v: Exact | undefined) => (v === undefined ? undefined : new Dec(v));

function sideOf(nearLower: boolean, nearUpper: boolean): Side {
  if (nearLower && nearUpper) return 'both';
  return nearUpper ? 'upper' : 'lower';
}

export function decideWithUncertainty(xIn: Exact, UIn: Exact, limits: LimitsLike): Decision {
  const [x, U, lower, upper] = [new Dec(xIn), new Dec(UIn), dec(limits.lower), dec(limits.upper)];
  if (upper && x.gt(upper)) return decision(x.gt(upper.plus(U)) ? 'fail' : 'conditional-fail', 'upper');
  if (lower && x.lt(lower)) return decision(x.lt(lower.minus(U)) ? 'fail' : 'conditional-fail', 'lower');
  const nearUpper = upper !== undefined && x.gte(upper.minus(U));
  const nearLower = lower !== undefined && x.lte(lower.plus(U));
  if (nearUpper || nearLower) return decision('conditional-pass', sideOf(nearLower, nearUpper));
  return decision('pass');
}

export function nearBands(limits: LimitsLike, rule: BandRule = {}): NearBands {
  const [lower, upper] = [dec(limits.lower), dec(limits.upper)];
  if (rule.nearLimit != null) {
    const band = new Dec(rule.nearLimit);
    return { lower: lower && band, upper: upper && band, basis: 'absolute' };
  }
  if (lower && upper) {
    const pct = rule.nearLimitPct ?? DEFAULT_NEAR_LIMIT_PCT;
    const band = upper.minus(lower).times(pct).div(100);
    return { lower: band, upper: band, basis: 'width', pct };
  }
  if (rule.nearLimitPct == null) return { basis: 'none' };
  const pct = rule.nearLimitPct;
  const of = (limit: Dec | undefined) => limit && limit.abs().times(pct).div(100);
  return { lower: of(lower), upper: of(upper), basis: 'limit', pct };
}

export function decideWithoutUncertainty(
  xIn: Exact,
  limits: LimitsLike,
  bands: NearBands = { basis: 'none' },
): Decision {
  const [x, lower, upper] = [new Dec(xIn), dec(limits.lower), dec(limits.upper)];
  if (upper && x.gt(upper)) return decision('fail', 'upper');
  if (lower && x.lt(lower)) return decision('fail', 'lower');
  const nearUpper = upper !== undefined && upper.minus(x).lte(bands.upper ?? 0);
  const nearLower = lower !== undefined && x.minus(lower).lte(bands.lower ?? 0);
  if (nearUpper || nearLower) return decision('conditional-pass', sideOf(nearLower, nearUpper));
  return decision('pass');
}
