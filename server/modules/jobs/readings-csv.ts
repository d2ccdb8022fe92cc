/** A job's readings as CSV (RFC 4180, free text neutralised against formula injection). */
import { neutraliseCell } from '@/lib/csv';
import type { JobDetailDto } from '@/lib/contracts/jobs';

const COLUMNS = [
  'reading_id',
  'taken_at',
  'component',
  'measured',
  'raw_value',
  'raw_unit',
  'value',
  'unit',
  'expanded_uncertainty',
  'verdict',
  'reason',
  'spec_min',
  'spec_max',
  'spec_unit',
  'spec_version',
  'spec_changed_since',
  'citation',
  'superseded_by',
] as const;

function cell(value: unknown, text: boolean): string {
  if (value === null || value === undefined) return '';
  const s = text ? neutraliseCell(String(value)) : String(value);
  return /[",\r\n]|^\s|\s$|^'/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function readingsCsv(job: JobDetailDto): string {
  const rows = job.readings.map((r) => {
    const raw = (r.inputs.reading ?? {}) as { value?: number; unit?: string };
    // A beep-only check has no number: raw_value holds what the meter showed, in words.
    const check = r.inputs.check !== undefined;
    const values: [unknown, boolean][] = [
      [r.id, false],
      [r.takenAt, false],
      [r.componentName, true],
      [r.label, true],
      check ? [r.valueText, true] : [raw.value, false],
      [raw.unit, true],
      [check ? null : r.value, false],
      [r.unit, true],
      [r.expandedUncertainty, false],
      [r.verdict, false],
      [r.reason, true],
      [r.specLimits.min, false],
      [r.specLimits.max, false],
      [r.specLimits.unit, true],
      [r.specVersion, false],
      [r.specChangedSince ? 'yes' : 'no', false],
      [r.citation, true],
      [r.supersededBy, false],
    ];
    return values.map(([v, text]) => cell(v, text)).join(',');
  });
  return [COLUMNS.join(','), ...rows].join('\r\n') + '\r\n';
}
