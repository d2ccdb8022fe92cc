/**
 * Whole-file validation: parse, validate every row, then the cross-row rule that a
 * natural key (make + model + years + variant + component + parameter) appears once.
 */
import {
  COLUMN_TO_FIELD,
  KEY_COLUMNS,
  SPEC_CSV_COLUMNS,
  type RowProblem,
  type SpecCsvColumn,
  type SpecCsvRow,
} from './columns';
import { parseSpecCsvDetailed } from './parse';
import { validateSpecRow } from './row-schema';

type KeyFields = Pick<SpecCsvRow, 'make' | 'model' | 'yearFrom' | 'yearTo' | 'variant' | 'component' | 'parameter'>;

/** NFC where the engine has it (so OHM SIGN and GREEK OMEGA match), then case and spaces. */
const normaliseText = (s: string) =>
  (typeof s.normalize === 'function' ? s.normalize('NFC') : s).toLowerCase().replace(/\s+/g, ' ').trim();

/** Identity of a spec: case-insensitive, whitespace-normalised; an open year_to is ''. */
export function naturalKey(row: KeyFields): string {
  return [
    normaliseText(row.make),
    normaliseText(row.model),
    String(row.yearFrom),
    row.yearTo === null ? '' : String(row.yearTo),
    normaliseText(row.variant),
    normaliseText(row.component),
    normaliseText(row.parameter),
  ].join('\u001f');
}

const VALUE_COLUMNS = SPEC_CSV_COLUMNS.filter((c) => !KEY_COLUMNS.includes(c));

/** Value columns (everything outside the key) that differ between two rows with one key. */
function differingColumns(a: SpecCsvRow, b: SpecCsvRow): SpecCsvColumn[] {
  return VALUE_COLUMNS.filter((c) => a[COLUMN_TO_FIELD[c]] !== b[COLUMN_TO_FIELD[c]]);
}

export type ValidatedCsv = {
  accepted: { line: number; row: SpecCsvRow; warnings: RowProblem[] }[];
  /** The problems of the first MAX_REJECTED_KEPT rejected rows, by line. */
  rejected: RowProblem[];
  /** How many rows were rejected in all. */
  rejectedRows: number;
  fileErrors: RowProblem[];
  tooManyRows?: boolean;
};

/** Rejected rows whose problems are kept and shown; the rest are counted (a file of junk stays small in memory). */
export const MAX_REJECTED_KEPT = 1000;

/**
 * Parses and validates a whole file. `fileErrors` (empty file, bad header, unclosed quote…)
 * mean the file must not be committed. Rows with the wrong number of cells are reported in
 * `rejected` (the row is bad, the rest of the file is fine). A repeated natural key rejects
 * the later line: as a duplicate when every value is the same, as a conflict otherwise.
 */
export function validateSpecCsv(text: string): ValidatedCsv {
  const parsed = parseSpecCsvDetailed(text);
  const result: ValidatedCsv = {
    accepted: [],
    rejected: [...parsed.rowErrors],
    rejectedRows: parsed.rowErrorCount,
    fileErrors: parsed.fileErrors,
    tooManyRows: parsed.tooManyRows,
  };
  let keptLines = new Set(parsed.rowErrors.map((e) => e.line)).size;
  const reject = (line: number, problems: RowProblem[]) => {
    result.rejectedRows += 1;
    if (keptLines >= MAX_REJECTED_KEPT) return;
    keptLines += 1;
    result.rejected.push(...problems.map((p) => ({ ...p, line })));
  };
  const firstByKey = new Map<string, { line: number; row: SpecCsvRow }>();
  for (const { line, raw } of parsed.rows) {
    const checked = validateSpecRow(raw, line);
    if (!checked.ok) {
      reject(line, checked.errors);
      continue;
    }
    const key = naturalKey(checked.row);
    const first = firstByKey.get(key);
    if (!first) {
      firstByKey.set(key, { line, row: checked.row });
      result.accepted.push({ line, row: checked.row, warnings: checked.warnings });
      continue;
    }
    const differing = differingColumns(first.row, checked.row);
    reject(line, [
      {
        line,
        column: differing[0] ?? null,
        reason:
          differing.length === 0
            ? `duplicate of line ${first.line}: the same spec with the same values appears twice`
            : `conflicts with line ${first.line}: the same spec (make, model, years, variant, component, parameter) with a different ${differing.join(', ')}`,
      },
    ]);
  }
  result.rejected.sort((a, b) => a.line - b.line);
  return result;
}
