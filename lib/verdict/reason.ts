/**
 * The one-sentence reason shown beside a verdict. It names the limit involved and, when the
 * uncertainty is known, the interval x ± U that decided it.
 */
import { formatQuantity, formatRange } from '../units';
import type { Decision, NearBands } from './decision';
import type { CheckedSpec } from './spec';

const NO_METER = 'No meter accuracy was given, so the uncertainty is unknown.';

function limitText(spec: CheckedSpec, side: 'lower' | 'upper'): string {
  return side === 'upper'
    ? `the maximum ${formatQuantity(spec.upper as number, spec.unit)}`
    : `the minimum ${formatQuantity(spec.lower as number, spec.unit)}`;
}

function insideText(spec: CheckedSpec): string {
  if (spec.lower !== undefined && spec.upper !== undefined) {
    return `Inside ${formatRange(spec.lower, null, spec.upper, spec.unit)}`;
  }
  return spec.upper !== undefined
    ? `At or below ${limitText(spec, 'upper')}`
    : `At or above ${limitText(spec, 'lower')}`;
}

const outsideText = (spec: CheckedSpec, side: 'lower' | 'upper') =>
  `${side === 'upper' ? 'Above' : 'Below'} ${limitText(spec, side)}`;

export function reasonWithUncertainty(d: Decision, x: number, U: number, spec: CheckedSpec): string {
  const interval = `its uncertainty interval ${formatRange(x - U, null, x + U, spec.unit)}`;
  const side = d.side === 'lower' ? 'lower' : 'upper';
  switch (d.zone) {
    case 'pass':
      return `${insideText(spec)} with ${interval}.`;
    case 'conditional-pass':
      return d.side === 'both'
        ? `${insideText(spec)}, but ${interval} spans both limits: the measurement cannot decide (ILAC-G8 conditional pass).`
        : `${insideText(spec)}, but ${interval} reaches ${limitText(spec, side)}: conformity is not proven (ILAC-G8 conditional pass).`;
    case 'conditional-fail':
      return `${outsideText(spec, side)}, but ${interval} reaches back to it: non-conformity is not proven (ILAC-G8 conditional fail).`;
    case 'fail':
      return `${outsideText(spec, side)} even allowing for ${interval}.`;
  }
}

export function reasonWithoutUncertainty(d: Decision, x: number, spec: CheckedSpec, bands: NearBands): string {
  const side = d.side === 'lower' ? 'lower' : 'upper';
  if (d.zone === 'fail') {
    const limit = (side === 'upper' ? spec.upper : spec.lower) as number;
    return `${outsideText(spec, side)} by ${formatQuantity(Math.abs(x - limit), spec.unit)}. ${NO_METER}`;
  }
  if (d.zone === 'pass') return `${insideText(spec)}. ${NO_METER}`;
  const twoSided = spec.lower !== undefined && spec.upper !== undefined;
  const basis = twoSided ? 'of the tolerance width' : 'of the limit';
  const band = formatQuantity((side === 'upper' ? bands.upper : bands.lower) as number, spec.unit);
  const where = d.side === 'both' ? 'of both limits' : `of ${limitText(spec, side)}`;
  return `${insideText(spec)} but within ${band} ${where} (near-limit band ${spec.nearLimitPct} % ${basis}). ${NO_METER}`;
}
