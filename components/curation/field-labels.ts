/** Plain names for spec fields in diffs, previews and the conflict view. */
export const FIELD_LABEL: Record<string, string> = {
  parameter: 'Parameter',
  min: 'Minimum',
  nominal: 'Nominal',
  max: 'Maximum',
  unit: 'Unit',
  refTempC: 'Reference °C',
  material: 'Winding',
  testPoints: 'Test points',
  conditions: 'Conditions',
  notes: 'Notes',
  status: 'Status',
  source: 'Source',
  sourceTitle: 'Source title',
  sourceEdition: 'Source edition',
  sourcePage: 'Source page',
  sourceUrl: 'Source link',
  created: 'Created',
};

export const fieldLabel = (field: string) => FIELD_LABEL[field] ?? field;

/** A value as a diff shows it; empty → an em dash. */
export const showValue = (v: unknown) => (v === null || v === undefined || v === '' ? '—' : String(v));
