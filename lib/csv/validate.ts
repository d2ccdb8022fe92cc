/**
 * File validation: parse, validate every row, and the cross-row rule that a natural key
 * (make + model + years + variant + component + parameter) appears once. Whole files at
 * once (validateSpecCsv), or row by row (SpecCsvValidator) for a caller that works in chunks.
 */
import { COLUMN_TO_FIELD, KEY_COLUMNS, SPEC_CSV_COLUMNS, type RowProblem, type SpecCsvRow } from './columns';
import { parseSpecCsvDetailed, type DetailedParse } from './parse';
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

/** A row's value columns as one string, kept for the first row of each key (not the row itself). */
const valueCells = (row: SpecCsvRow) =>
  VALUE_COLUMNS.map((c) => {
    const v = row[COLUMN_TO_FIELD[c]];
    return v === undefined ? '' : JSON.stringify(v);
  });

export type AcceptedRow = { line: number; row: SpecCsvRow; warnings: RowProblem[] };

export type ValidatedCsv = {
  accepted: AcceptedRow[];
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
 * The row rules of a parsed file, row by row, so that a caller can take the accepted rows
 * in chunks and let them go (the importer stages each chunk). It keeps, across the file,
 * only each natural key's first line and values (for the duplicate and conflict messages)
 * and the problems of the first MAX_REJECTED_KEPT rejected rows.
 */
export class SpecCsvValidator {
  readonly result: Omit<ValidatedCsv, 'accepted'>;
  private keptLines: number;
  private readonly firstByKey = new Map<string, { line: number; values: string }>();

  constructor(parsed: DetailedParse) {
    this.result = {
      rejected: [...parsed.rowErrors],
      rejectedRows: parsed.rowErrorCount,
      fileErrors: parsed.fileErrors,
      tooManyRows: parsed.tooManyRows,
    };
    this.keptLines = new Set(parsed.rowErrors.map((e) => e.line)).size;
  }

  private reject(line: number, problems: RowProblem[]) {
    this.result.rejectedRows += 1;
    if (this.keptLines >= MAX_REJECTED_KEPT) return;
    this.keptLines += 1;
    this.result.rejected.push(...problems.map((p) => ({ ...p, line })));
  }

  /** The row if it is accepted; otherwise its problems are recorded and the answer is null. */
  check(line: number, raw: Record<string, string>): AcceptedRow | null {
    const checked = validateSpecRow(raw, line);
    if (!checked.ok) {
      this.reject(line, checked.errors);
      return null;
    }
    const key = naturalKey(checked.row);
    const values = valueCells(checked.row);
    const first = this.firstByKey.get(key);
    if (!first) {
      this.firstByKey.set(key, { line, values: values.join('\u001f') });
      return { line, row: checked.row, warnings: checked.warnings };
    }
    const before = first.values.split('\u001f');
    const differing = VALUE_COLUMNS.filter((_, i) => before[i] !== values[i]);
    this.reject(line, [
      {
        line,
        column: differing[0] ?? null,
        reason:
          differing.length === 0
            ? `duplicate of line ${first.line}: the same spec with the same values appears twice`
            : `conflicts with line ${first.line}: the same spec (make, model, years, variant, component, parameter) with a different ${differing.join(', ')}`,
      },
    ]);
    return null;
  }

  /** The kept problems in line order, once every row is checked. */
  finish(): Omit<ValidatedCsv, 'accepted'> {
    this.result.rejected.sort((a, b) => a.line - b.line);
    return this.result;
  }
}

/**
 * Parses and validates a whole file. `fileErrors` (empty file, bad header, unclosed quote…)
 * mean the file must not be committed. Rows with the wrong number of cells are reported in
 * `rejected` (the row is bad, the rest of the file is fine). A repeated natural key rejects
 * the later line: as a duplicate when every value is the same, as a conflict otherwise.
 */
export function validateSpecCsv(text: string): ValidatedCsv {
  const parsed = parseSpecCsvDetailed(text);
  const validator = new SpecCsvValidator(parsed);
  const accepted: AcceptedRow[] = [];
  for (const { line, raw } of parsed.rows) {
    const row = validator.check(line, raw);
    if (row) accepted.push(row);
  }
  return { accepted, ...validator.finish() };
}
