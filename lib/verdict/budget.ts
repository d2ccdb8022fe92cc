/**
 * Step 4: the uncertainty budget. The raw reading and the lead reading are two readings on
 * the same meter, each with a = p/100·|x| + n·d; the series resistor contributes its tolerance
 * as a rectangular half-width (a resistor given without a tolerance is treated as exact, and
 * the step says so). The combined u is scaled by the temperature factor, then U = 2·u_c.
 * Uncertainties are estimates, so they are computed in floating point; only the comparisons
 * with the limits (./decision) are exact.
 */
import { formatNumber } from '../units';
import type { Corrected } from './corrections';
import type { CheckedSpec } from './spec';
import { VerdictInputError, type MeterAccuracy, type VerdictStep } from './types';
import { COVERAGE_FACTOR, meterHalfWidth, rectangularStd, rootSumSquare } from './uncertainty';

export type Budget = { U: number | null; steps: VerdictStep[] };

const s6 = (value: number, unit: string) => `${formatNumber(value, 6)}${unit ? ` ${unit}` : ''}`;

function meterTerm(what: string, x: number, meter: MeterAccuracy, spec: CheckedSpec, steps: VerdictStep[]): number {
  const a = meterHalfWidth({ value: x, unit: spec.unit }, meter);
  const count = `${meter.counts} × ${s6(meter.countValue, meter.unit)}`;
  steps.push({
    label: `Meter half-width on ${what}`,
    formula: `a = ${meter.percent} % × ${s6(Math.abs(x), spec.unit)} + ${count} = ${s6(a, spec.unit)}`,
    value: a,
    unit: spec.unit,
  });
  const u = rectangularStd(a);
  steps.push({
    label: `Standard uncertainty of ${what} (rectangular)`,
    formula: `u = a / √3 = ${s6(a, spec.unit)} / √3 = ${s6(u, spec.unit)}`,
    value: u,
    unit: spec.unit,
  });
  return u;
}

function seriesTerm(c: Corrected, spec: CheckedSpec, steps: VerdictStep[]): number {
  const series = (c.series as NonNullable<Corrected['series']>).toNumber();
  if (c.seriesTolerancePct === undefined) {
    steps.push({
      label: 'Series resistor tolerance not given: treated as exact (no uncertainty added)',
      value: 0,
      unit: spec.unit,
    });
    return 0;
  }
  const u = rectangularStd((c.seriesTolerancePct / 100) * series);
  steps.push({
    label: 'Standard uncertainty of the series resistor (tolerance, rectangular)',
    formula: `u = ${c.seriesTolerancePct} % × ${s6(series, spec.unit)} / √3 = ${s6(u, spec.unit)}`,
    value: u,
    unit: spec.unit,
  });
  return u;
}

export function uncertaintyBudget(meter: MeterAccuracy | null | undefined, c: Corrected, spec: CheckedSpec): Budget {
  if (meter == null) return { U: null, steps: [] };
  if (typeof meter !== 'object') throw new VerdictInputError('meter', 'meter must be an object');
  const steps: VerdictStep[] = [];
  const parts = [meterTerm('the reading', c.raw.toNumber(), meter, spec, steps)];
  if (c.lead !== undefined) parts.push(meterTerm('the lead reading', c.lead.toNumber(), meter, spec, steps));
  if (c.series !== undefined) parts.push(seriesTerm(c, spec, steps));
  let uc = rootSumSquare(parts);
  if (parts.length > 1) {
    const names = parts.map((_, i) => `u${i + 1}²`).join(' + ');
    steps.push({
      label: 'Combined standard uncertainty',
      formula: `u_c = √(${names}) = ${s6(uc, spec.unit)}`,
      value: uc,
      unit: spec.unit,
    });
  }
  const factor = c.factor.toNumber();
  if (factor !== 1) {
    const before = uc;
    uc *= factor;
    steps.push({
      label: 'Scaled by the temperature factor',
      formula: `${s6(before, spec.unit)} × ${factor.toPrecision(6)} = ${s6(uc, spec.unit)}`,
      value: uc,
      unit: spec.unit,
    });
  }
  const U = COVERAGE_FACTOR * uc;
  steps.push({
    label: 'Expanded uncertainty (k = 2, about 95 %)',
    formula: `U = 2 × ${s6(uc, spec.unit)} = ${s6(U, spec.unit)}`,
    value: U,
    unit: spec.unit,
  });
  return { U, steps };
}
