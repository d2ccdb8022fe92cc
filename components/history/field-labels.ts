/** Plain names for spec fields in diffs, previews and the conflict view (lib/contracts/spec-fields.ts). */
import { FIELD_LABEL } from '@/lib/contracts/spec-fields';

export { FIELD_LABEL };

export const fieldLabel = (field: string) => FIELD_LABEL[field] ?? field;

/** A value as a diff shows it; empty → an em dash. */
export const showValue = (v: unknown) => (v === null || v === undefined || v === '' ? '—' : String(v));
