/** Plain names for spec fields in diffs, previews and the conflict view (lib/contracts/spec-fields.ts). */
import { MEASUREMENT_MODE_LABEL, type MeasurementMode } from '@/lib/contracts/enums';
import { FIELD_LABEL } from '@/lib/contracts/spec-fields';

export { FIELD_LABEL };

export const fieldLabel = (field: string) => FIELD_LABEL[field] ?? field;

/** A value as a diff shows it; empty → an em dash; a meter mode in words. */
export function showValue(v: unknown, field?: string): string {
  if (v === null || v === undefined || v === '') return '—';
  if (field === 'mode' && typeof v === 'string' && v in MEASUREMENT_MODE_LABEL)
    return MEASUREMENT_MODE_LABEL[v as MeasurementMode];
  return String(v);
}
