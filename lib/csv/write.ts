/**
 * Export in the import format (RFC 4180 §2): CRLF after every record, fields quoted when
 * they contain , " CR or LF (rule 6) or begin / end with a space (so spreadsheets keep
 * it), inner quotes doubled (rule 7). Text cells that a spreadsheet would run as a formula
 * are neutralised with a leading ' and quoted; numeric columns are written as plain
 * numbers, so a negative limit or temperature stays a number.
 */
import { COLUMN_TO_FIELD, NUMERIC_COLUMNS, SPEC_CSV_COLUMNS, type SpecCsvColumn, type SpecCsvRow } from './columns';
import { neutraliseCell } from './injection';

const NEEDS_QUOTES = /[",\r\n]|^\s|\s$/;

/** One RFC 4180 field: quoted when needed, with inner quotes doubled. */
export function quoteField(value: string, forceQuotes = false): string {
  return forceQuotes || NEEDS_QUOTES.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/** Numbers as JavaScript writes them (shortest round-trip form, '-' for negatives). */
function numberCell(value: unknown): string {
  return typeof value === 'number' && Number.isFinite(value) ? String(value) : '';
}

function textCell(value: unknown): string {
  const s = value === null || value === undefined ? '' : String(value);
  const neutralised = neutraliseCell(s);
  return quoteField(neutralised, neutralised !== s);
}

function cell(row: SpecCsvRow, column: SpecCsvColumn): string {
  const value = row[COLUMN_TO_FIELD[column]];
  return NUMERIC_COLUMNS.includes(column) ? numberCell(value) : textCell(value);
}

/** Header plus one record per row, every record ending in CRLF. */
export function toSpecCsv(rows: SpecCsvRow[]): string {
  const lines = [SPEC_CSV_COLUMNS.join(',')];
  for (const row of rows) lines.push(SPEC_CSV_COLUMNS.map((column) => cell(row, column)).join(','));
  return lines.map((l) => `${l}\r\n`).join('');
}
