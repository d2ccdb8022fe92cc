/**
 * The one-sentence reason shown beside a verdict. It names the limit involved and, when the
 * uncertainty is known, the interval x ± U that decided it (the formal statement; the plain
 * words are ./words).
 */
import { formatQuantity, formatRange } from '../units';
import type { Decision, NearBands } from './decision';
import type { CheckedSpec } from './spec';

const NO_METER = 'No meter accuracy was given, so the uncertainty is unknown.';

export function limitText(spec: CheckedSpec, side: 'lower' | 'upper'): string {
  return side === 'upper'
    ? `the maximum ${formatQuantity(spec.upper as number, spec.unit)}`
    : `the minimum ${formatQuantity(spec.lower as number, spec.unit)}`;
}

export function insideText(spec: CheckedSpec): string {
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

/** 'near-limit band 5 % of the tolerance width' / '… 0.2 V, as the spec states' / none. */
export function bandBasisText(spec: CheckedSpec, bands: NearBands): string {
  if (bands.basis === 'absolute') return 'near-limit band stated by the spec';
  if (bands.basis === 'width') return `near-limit band ${bands.pct} % of the tolerance width`;
  return `near-limit band ${bands.pct} % of the limit, as the spec states`;
}

export function reasonWithoutUncertainty(d: Decision, distance: number, spec: CheckedSpec, bands: NearBands): string {
  const side = d.side === 'lower' ? 'lower' : 'upper';
  if (d.zone === 'fail') {
    return `${outsideText(spec, side)} by ${formatQuantity(distance, spec.unit)}. ${NO_METER}`;
  }
  if (d.zone === 'pass') return `${insideText(spec)}. ${NO_METER}`;
  const band = side === 'upper' ? bands.upper : bands.lower;
  if (!band || band.isZero()) {
    return `Exactly on ${limitText(spec, side)}: neither a pass nor a fail without knowing the meter's accuracy. ${NO_METER}`;
  }
  const where = d.side === 'both' ? 'of both limits' : `of ${limitText(spec, side)}`;
  return `${insideText(spec)} but within ${formatQuantity(band.toNumber(), spec.unit)} ${where} (${bandBasisText(spec, bands)}). ${NO_METER}`;
}
