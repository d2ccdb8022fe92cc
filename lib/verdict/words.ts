/**
 * The verdict in workshop words, corrections first, then where the value lies and what that
 * means at the bike ("2.8 Ω after taking off 0.4 Ω for the leads — inside 2.1–2.9 Ω, but so
 * close to the top that the meter's accuracy could put it over"). The formal statement (ILAC
 * zones, p_c) stays in the reason and the steps, behind "Show the working".
 */
import { formatExact, formatNumber, formatQuantity, formatRange, type Dec } from '../units';
import type { Corrected } from './corrections';
import { q } from './corrections';
import type { Decision } from './decision';
import type { CheckedSpec } from './spec';

export type WordsInput = { d: Decision; c: Corrected; spec: CheckedSpec; U: number | null; valueText: string };

function corrections({ c, spec }: WordsInput): string {
  const off = [
    c.typed.lead && `${q(c.typed.lead.value, c.typed.lead.unit)} for the leads`,
    c.typed.series && `${q(c.typed.series.value, c.typed.series.unit)} for the resistor`,
  ].filter(Boolean);
  const parts = off.length ? [` after taking off ${off.join(' and ')}`] : [];
  if (!c.factor.eq(1)) parts.push(`, referred from ${c.typed.temperatureC} °C to ${spec.refTempC} °C`);
  if (!off.length && c.typed.reading.unit !== spec.unit) {
    parts.push(` (${q(c.typed.reading.value, c.typed.reading.unit)} as read)`);
  }
  return parts.join('');
}

function range(spec: CheckedSpec): string {
  if (spec.lower !== undefined && spec.upper !== undefined) {
    return `inside ${formatRange(spec.lower, null, spec.upper, spec.unit)}`;
  }
  return spec.lower !== undefined
    ? `above the minimum ${formatQuantity(spec.lower, spec.unit)}`
    : `below the maximum ${formatQuantity(spec.upper as number, spec.unit)}`;
}

const limitOf = (spec: CheckedSpec, side: 'lower' | 'upper') =>
  side === 'upper'
    ? `the maximum ${formatQuantity(spec.upper as number, spec.unit)}`
    : `the minimum ${formatQuantity(spec.lower as number, spec.unit)}`;

function where(w: WordsInput): string {
  const { d, spec, U, c } = w;
  const side = d.side === 'lower' ? 'lower' : 'upper';
  const accuracy = U === null ? "the meter's accuracy" : `the meter's accuracy (± ${formatNumber(U, 2)} ${spec.unit})`;
  const limit = (side === 'upper' ? spec.exact.upper : spec.exact.lower) as Dec;
  const by = limit ? `${formatExact(c.value.minus(limit).abs(), c.decimals)} ${spec.unit}` : '';
  switch (d.zone) {
    case 'pass':
      return U === null ? `${range(spec)}.` : `${range(spec)}, even allowing for ${accuracy}.`;
    case 'conditional-pass':
      if (d.side === 'both') {
        return `${range(spec)}, but ${accuracy} is wider than the tolerance itself: this meter cannot decide. Use a more accurate range.`;
      }
      if (c.value.eq(limit)) {
        return `exactly on ${limitOf(spec, side)}: on the line, so neither a clear pass nor a fail. Measure again${U === null ? ", and enter the meter's accuracy" : ''}.`;
      }
      return `${range(spec)}, but so close to the ${side === 'upper' ? 'top' : 'bottom'} that ${accuracy} could put it ${side === 'upper' ? 'over' : 'under'}.`;
    case 'conditional-fail':
      return `just ${side === 'upper' ? 'over' : 'under'} ${limitOf(spec, side)}, by ${by}, which is less than ${accuracy}: it may really be in spec. Measure again before condemning the part.`;
    case 'fail':
      return `${side === 'upper' ? 'over' : 'under'} ${limitOf(spec, side)} by ${by}${U === null ? '' : `, even allowing for ${accuracy}`}: out of spec.`;
  }
}

/** A voltage or current read negative against limits that are all positive: the probes are on the wrong way round. */
export function probesReversed(c: Corrected, spec: CheckedSpec): boolean {
  if (spec.kind !== 'voltage' && spec.kind !== 'current') return false;
  const limits = [spec.exact.lower, spec.exact.upper].filter((l): l is Dec => l !== undefined);
  return (
    c.value.isNegative() && !c.value.isZero() && limits.every((l) => !l.isNegative()) && limits.some((l) => l.gt(0))
  );
}

export const REVERSED =
  'The reading is negative but this spec is positive: the probes are probably reversed. Put red on + and black on −, and measure again.';

export function explanation(w: WordsInput): string {
  const head = `${w.valueText} ${w.spec.unit}${corrections(w)} — ${where(w)}`;
  return probesReversed(w.c, w.spec) ? `${REVERSED} ${head}` : head;
}
