/**
 * Display rounding only. Values are stored and compared unrounded; these helpers make the
 * short strings a technician reads ('3.9 Ω', '2.9–3.7 Ω', '≥ 12.6 V').
 */
import type { CanonicalUnit } from './kinds';

const EN_DASH = '\u2013';

/** Rounds to `significant` figures (default 4) and drops trailing zeros; never exponent form in the usual range. */
export function formatNumber(value: number, significant = 4): string {
  if (Number.isNaN(value)) return 'NaN';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '-∞';
  const digits = Math.min(21, Math.max(1, Math.round(significant)));
  const rounded = Number(value.toPrecision(digits));
  if (rounded === 0) return '0';
  const magnitude = Math.abs(rounded);
  if (magnitude >= 1e-6 && magnitude < 1e21) return String(rounded);
  return rounded.toExponential(digits - 1).replace(/\.?0+e/, 'e');
}

export function formatQuantity(value: number, unit: CanonicalUnit): string {
  return `${formatNumber(value)} ${unit}`;
}

const present = (v: number | null | undefined): v is number => typeof v === 'number';

/**
 * '2.9–3.7 Ω' for min and max, '≥ 12.6 V' for a minimum only, '≤ 15 A' for a maximum only,
 * '0.8 mm' for a nominal only; a nominal beside limits is appended as '(nominal 12.6)'.
 * No values at all gives '—'.
 */
export function formatRange(
  min: number | null | undefined,
  nominal: number | null | undefined,
  max: number | null | undefined,
  unit: CanonicalUnit,
): string {
  const note = present(nominal) ? ` (nominal ${formatNumber(nominal)})` : '';
  if (present(min) && present(max)) return `${formatNumber(min)}${EN_DASH}${formatNumber(max)} ${unit}${note}`;
  if (present(min)) return `≥ ${formatQuantity(min, unit)}${note}`;
  if (present(max)) return `≤ ${formatQuantity(max, unit)}${note}`;
  if (present(nominal)) return formatQuantity(nominal, unit);
  return '—';
}
