/**
 * Geometry of the tolerance-band picture: where the limits, the marginal zones, the
 * reading and its uncertainty interval fall on a horizontal axis. Pure, so it can be
 * tested without drawing.
 */
import type { VerdictResult } from '../verdict';

export type Band = {
  domain: [number, number];
  lower?: number;
  upper?: number;
  /** Marginal zones: [from, to] pairs straddling or inside the limits. */
  marginal: [number, number][];
  value: number;
  interval?: [number, number];
};

export function bandOf(result: VerdictResult): Band {
  const { lower, upper, nearBand, interval } = result.zones;
  const x = result.value;
  const U = result.expandedUncertainty;
  const marginal: [number, number][] = [];
  for (const limit of [lower, upper]) {
    if (limit === undefined) continue;
    if (U !== null) marginal.push([limit - U, limit + U]);
    else if (nearBand) marginal.push(limit === lower ? [limit, limit + nearBand] : [limit - nearBand, limit]);
  }
  const points = [x, lower, upper, ...(interval ?? [])].filter((v): v is number => v !== undefined);
  let lo = Math.min(...points);
  let hi = Math.max(...points);
  const span = hi - lo || Math.abs(hi) || 1;
  lo -= span * 0.25;
  hi += span * 0.25;
  // One-sided specs: leave room on the open side so the limit is not at the edge.
  if (lower !== undefined && upper === undefined) hi = Math.max(hi, lower + span);
  if (upper !== undefined && lower === undefined) lo = Math.min(lo, upper - span);
  return { domain: [lo, hi], lower, upper, marginal, value: x, interval };
}

/** Maps a value to an x position in [0, width]. */
export function scale(band: Band, width: number) {
  const [lo, hi] = band.domain;
  return (v: number) => ((Math.min(Math.max(v, lo), hi) - lo) / (hi - lo)) * width;
}
