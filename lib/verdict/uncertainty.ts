/**
 * Meter accuracy to uncertainty. A handheld meter's ±(p % of reading + n counts) is read
 * as the half-width a of a rectangular distribution, u = a/√3 (JCGM 100:2008 §4.3.7);
 * independent contributions add in quadrature and U = 2·u (NIST TN 1297 §6.2).
 */
import { convert, UnitMismatchError } from '../units';
import { VerdictInputError, type MeterAccuracy, type Quantity } from './types';
import { requireFinite, requireUnit } from './validate';

export const COVERAGE_FACTOR = 2;
/** A meter's accuracy is a few % of reading at worst; more than 100 % is not an accuracy. */
export const MAX_METER_PERCENT = 100;
/** Counts of the last digit: a few to a few hundred on any handheld meter. */
export const MAX_METER_COUNTS = 10000;

function requireNonNegative(value: unknown, field: string): number {
  const v = requireFinite(value, field);
  if (v < 0) throw new VerdictInputError(field, `${field} must not be negative`);
  return v;
}

/** a = p/100·|x| + n·d, with the count value d converted to the reading's unit. */
export function meterHalfWidth(reading: Quantity, meter: MeterAccuracy): number {
  const x = requireFinite(reading.value, 'reading.value');
  const percent = requireNonNegative(meter.percent, 'meter.percent');
  if (percent > MAX_METER_PERCENT) {
    throw new VerdictInputError('meter.percent', `meter.percent must be at most ${MAX_METER_PERCENT} % of reading`);
  }
  const counts = requireNonNegative(meter.counts, 'meter.counts');
  if (counts > MAX_METER_COUNTS) {
    throw new VerdictInputError('meter.counts', `meter.counts must be at most ${MAX_METER_COUNTS}`);
  }
  const countValue = requireNonNegative(meter.countValue, 'meter.countValue');
  if (counts > 0 && countValue === 0) {
    throw new VerdictInputError(
      'meter.countValue',
      'meter.countValue must be the value of one count (the last digit on the range used), not 0, when counts are given',
    );
  }
  const meterUnit = requireUnit(meter.unit, 'meter.unit').unit;
  const readingUnit = requireUnit(reading.unit, 'reading.unit').unit;
  let d: number;
  try {
    d = convert(countValue, meterUnit, readingUnit);
  } catch (err) {
    if (!(err instanceof UnitMismatchError)) throw err;
    throw new VerdictInputError(
      'meter.unit',
      `The meter count is in ${meterUnit} but the reading is in ${readingUnit}`,
    );
  }
  const a = (percent / 100) * Math.abs(x) + counts * d;
  if (!Number.isFinite(a)) throw new VerdictInputError('meter', 'The meter accuracy gives no finite uncertainty');
  return a;
}

/** Standard uncertainty of a rectangular distribution of half-width a. */
export function rectangularStd(a: number): number {
  return a / Math.sqrt(3);
}

export function rootSumSquare(values: readonly number[]): number {
  return Math.sqrt(values.reduce((sum, v) => sum + v * v, 0));
}
