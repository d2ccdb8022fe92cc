/**
 * Spec-table CSV import and export (DESIGN.md §5), shared by the browser and the server:
 * bytes → text (checkCsvBytes, decodeCsv) → records (parseSpecCsvDetailed; eachSpecCsvChunk in chunks) → rows
 * (validateSpecRow / SpecCsvRowSchema) → file verdict (validateSpecCsv); and back out with
 * toSpecCsv. Pure TypeScript: no React, no Node I/O.
 */
export {
  SPEC_CSV_COLUMNS,
  COLUMN_REFERENCE,
  REQUIRED_COLUMNS,
  NUMERIC_COLUMNS,
  KEY_COLUMNS,
  type SpecCsvColumn,
  type SpecCsvRow,
  type RowProblem,
} from './columns';
export { SpecCsvRowSchema, validateSpecRow } from './row-schema';
export { parseSpecCsvDetailed, type DetailedParse, type ParsedCsv } from './parse';
export { checkCsvBytes, decodeCsv } from './encoding';
export { naturalKey, validateSpecCsv, SpecCsvValidator, type AcceptedRow, type ValidatedCsv } from './validate';
export { neutraliseCell } from './injection';
export { toSpecCsv } from './write';
