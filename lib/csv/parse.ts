/**
 * RFC 4180 parsing (papaparse) of a spec CSV into raw rows keyed by column name, with the
 * physical line each record starts on and the file-level problems: empty file, bad header,
 * wrong delimiter, unclosed quotes, rows with the wrong number of cells.
 *
 * Papaparse runs with header: false so that we see duplicated header names (header: true
 * silently renames them) and can give each record its true starting line: we follow
 * papaparse's cursor and count line breaks (CRLF, LF or CR) up to each record's start, so
 * line numbers stay right after quoted multi-line cells.
 */
import Papa from 'papaparse';
import { REQUIRED_COLUMNS, SPEC_CSV_COLUMNS, type RowProblem, type SpecCsvColumn } from './columns';

export type ParsedCsv = { rows: { line: number; raw: Record<string, string> }[]; fileErrors: RowProblem[] };

/** As ParsedCsv, but problems confined to one record (wrong cell count) kept apart. */
export type DetailedParse = ParsedCsv & {
  rowErrors: RowProblem[];
  /** Rows with the wrong number of cells, all of them (rowErrors keeps the first ones). */
  rowErrorCount: number;
  /** The file has more rows than the limit: nothing of it is imported. */
  tooManyRows?: boolean;
};

type CsvRecord = { line: number; cells: string[]; errors: Papa.ParseError[] };

const LINE_BREAK = /\r\n?|\n/g;
const QUOTE_REASONS: Record<string, string> = {
  MissingQuotes:
    'a quoted cell that starts on this line is never closed (a closing " is missing), so the rest of the file cannot be read',
  InvalidQuotes:
    'a quoted cell has text after its closing quote; inside a quoted cell write a quote as two quotes ("")',
};

/**
 * Hands each record to `onRecord` as papaparse reads it, so no list of every record is
 * built. `onRecord` answers true to go on, false to stop reading (a file over the row
 * limit), or a promise: the parse pauses until it settles and stops if it fails. `done`
 * runs once the reading ends, with the failure if there was one. Without promises the
 * whole parse runs before readRecords returns.
 */
function readRecords(
  text: string,
  onRecord: (record: CsvRecord) => boolean | Promise<void>,
  done?: (failure?: { error: unknown }) => void,
) {
  // papaparse's cursor counts from where the parse last resumed (`base` in the text).
  let base = 0;
  let pos = 0;
  let line = 1;
  let failure: { error: unknown } | undefined;
  Papa.parse<string[]>(text, {
    delimiter: ',',
    header: false,
    skipEmptyLines: false,
    // Papaparse's fast mode (taken when no quote is left in the text) splits the whole rest of
    // the text into lines, again on every resume after a pause: quadratic in the chunked read
    // (4.4 s for 200 000 unquoted rows, against 0.5 s for the same rows read straight through).
    fastMode: false,
    step: (result, parser) => {
      const record = { line, cells: result.data, errors: result.errors };
      const end = result.meta.cursor;
      line += (text.slice(base + pos, base + end).match(LINE_BREAK) ?? []).length;
      pos = end;
      const next = onRecord(record);
      if (next === true) return;
      if (next === false) return parser.abort();
      parser.pause();
      base += pos;
      pos = 0;
      next.then(
        () => parser.resume(),
        (error: unknown) => {
          failure = { error };
          parser.abort();
        },
      );
    },
    complete: () => done?.(failure),
  });
}

/** Papaparse's quote errors for one record, one problem per kind. */
function quoteProblems(record: CsvRecord): RowProblem[] {
  const codes = [...new Set(record.errors.map((e) => e.code as string))];
  return codes.map((code) => ({
    line: record.line,
    column: null,
    reason: QUOTE_REASONS[code] ?? `this row could not be read (${code})`,
  }));
}

const isBlank = (cells: string[]) => cells.every((c) => c.trim() === '');
const normaliseHeader = (h: string) =>
  h
    .trim()
    .toLowerCase()
    .replace(/[\s-]+/g, '_');
const list = (names: string[]) => names.join(', ');

/** Header problems; an empty list means every column is known, unique, and the required ones are there. */
function checkHeader(header: string[], raw: string[], line: number): RowProblem[] {
  const problem = (reason: string, column: SpecCsvColumn | null = null): RowProblem => ({ line, column, reason });
  if (header.length === 1 && /[;\t|]/.test(raw[0])) {
    const sep = raw[0].includes(';') ? 'semicolons' : raw[0].includes('\t') ? 'tabs' : 'bars (|)';
    return [
      problem(
        `the header is one single column separated by ${sep}; use commas between columns (in a spreadsheet: save as "CSV UTF-8 (comma delimited)")`,
      ),
    ];
  }
  const problems: RowProblem[] = [];
  const known = SPEC_CSV_COLUMNS as readonly string[];
  const seen = new Set<string>();
  const duplicated = new Set<string>();
  header.forEach((h) => (seen.has(h) ? duplicated.add(h) : seen.add(h)));
  for (const d of duplicated)
    problems.push(
      problem(
        `column ${d || '(unnamed)'} appears more than once in the header`,
        known.includes(d) ? (d as SpecCsvColumn) : null,
      ),
    );
  const unknown = [...seen].filter((h) => !known.includes(h));
  if (unknown.length) {
    const names = unknown.map((h) => (h === '' ? '(an unnamed column)' : h));
    problems.push(
      problem(
        `unknown column${unknown.length > 1 ? 's' : ''}: ${list(names)}; the allowed columns are ${list([...known])}`,
      ),
    );
  }
  const missing = REQUIRED_COLUMNS.filter((c) => !seen.has(c));
  if (missing.length)
    problems.push(problem(`missing required column${missing.length > 1 ? 's' : ''}: ${list(missing)}`, missing[0]));
  if (!['min', 'nominal', 'max'].some((c) => seen.has(c)))
    problems.push(problem('the header needs at least one of the columns min, nominal or max'));
  return problems;
}

/** Cell-count check; surplus cells that are all empty (trailing commas) are tolerated. */
function cellCountProblem(cells: string[], width: number, line: number): RowProblem | null {
  if (cells.length > width && !isBlank(cells.slice(width))) {
    return {
      line,
      column: null,
      reason: `this row has ${cells.length} cells but the header has ${width} columns; a value that contains a comma must be put in double quotes`,
    };
  }
  if (cells.length < width) {
    return {
      line,
      column: null,
      reason: `this row has ${cells.length} cells but the header has ${width} columns; every row needs a cell (maybe empty) for every column`,
    };
  }
  return null;
}

/** Rows a file may have (the importer's limit, README "CSV import"); a longer file is refused whole. */
export const MAX_CSV_ROWS = 200_000;

/** Cell-count problems kept (the count of rejected rows is kept in full by the validator). */
const MAX_ROW_ERRORS = 1000;

/**
 * The record-by-record rules of a spec CSV: the header, blank lines, the row limit, quote
 * errors and cell counts. `take` answers the record's row when it is one, and whether to
 * stop reading; `end` adds the problems of a file that ended without data rows.
 */
class RecordRules {
  readonly result: DetailedParse = { rows: [], fileErrors: [], rowErrors: [], rowErrorCount: 0 };
  private header: string[] | null = null;
  private headerLine = 1;
  private data = 0;

  constructor(private readonly maxRows: number) {}

  take(record: CsvRecord): { row?: ParsedCsv['rows'][number]; stop?: boolean } {
    const result = this.result;
    if (isBlank(record.cells) && record.errors.length === 0) return {};
    if (this.header === null) {
      this.headerLine = record.line;
      if (record.errors.length) result.fileErrors.push(...quoteProblems(record));
      else
        result.fileErrors.push(
          ...checkHeader((this.header = record.cells.map(normaliseHeader)), record.cells, record.line),
        );
      return { stop: result.fileErrors.length > 0 };
    }
    this.data += 1;
    if (this.data > this.maxRows) {
      result.fileErrors.push({
        line: record.line,
        column: null,
        reason: `the file has more than ${this.maxRows.toLocaleString('en')} rows, the most one import takes; split it into smaller files`,
      });
      result.tooManyRows = true;
      return { stop: true };
    }
    if (record.errors.length) {
      result.fileErrors.push(...quoteProblems(record));
      return {};
    }
    const countProblem = cellCountProblem(record.cells, this.header.length, record.line);
    if (countProblem) {
      result.rowErrorCount += 1;
      if (result.rowErrors.length < MAX_ROW_ERRORS) result.rowErrors.push(countProblem);
      return {};
    }
    const raw: Record<string, string> = {};
    this.header.forEach((column, i) => (raw[column] = record.cells[i]));
    return { row: { line: record.line, raw } };
  }

  end(): DetailedParse {
    if (this.data === 0 && !this.result.fileErrors.length)
      this.result.fileErrors.push({
        line: this.headerLine,
        column: null,
        reason: 'the file has a header but no data rows',
      });
    return this.result;
  }
}

const withoutBom = (input: string) => (input.startsWith('\uFEFF') ? input.slice(1) : input);

const emptyFile = (): DetailedParse => ({
  rows: [],
  fileErrors: [{ line: 1, column: null, reason: 'the file is empty' }],
  rowErrors: [],
  rowErrorCount: 0,
});

/**
 * Parses a spec CSV (header row required), record by record. `line` is the physical 1-based
 * line where each record starts. When the header is unusable, `rows` is empty. Rows with the
 * wrong number of cells are left out and reported in `rowErrors` with their line (the rest of
 * the file is fine); `fileErrors` mean the file cannot be used. A file of more than `maxRows`
 * rows stops at once with `tooManyRows`. With `keepRows: false` the rows are only checked
 * (a caller that takes them later in chunks, see eachSpecCsvChunk).
 */
export function parseSpecCsvDetailed(
  input: string,
  maxRows = MAX_CSV_ROWS,
  { keepRows = true }: { keepRows?: boolean } = {},
): DetailedParse {
  const text = withoutBom(input);
  if (text.trim() === '') return emptyFile();
  const rules = new RecordRules(maxRows);
  readRecords(text, (record) => {
    const { row, stop } = rules.take(record);
    if (row && keepRows) rules.result.rows.push(row);
    return !stop;
  });
  return rules.end();
}

/**
 * The rows of a file that parseSpecCsvDetailed found usable, `size` at a time: `onRows`
 * runs for each chunk in file order, and the parse waits for it (papaparse's pause and
 * resume), so no more than one chunk of rows is ever held. Same rows and lines as
 * parseSpecCsvDetailed's.
 */
export function eachSpecCsvChunk(
  input: string,
  size: number,
  onRows: (rows: ParsedCsv['rows']) => Promise<void>,
  maxRows = MAX_CSV_ROWS,
): Promise<void> {
  const text = withoutBom(input);
  if (text.trim() === '') return Promise.resolve();
  const rules = new RecordRules(maxRows);
  return new Promise((resolve, reject) => {
    let pending: ParsedCsv['rows'] = [];
    readRecords(
      text,
      (record) => {
        const { row, stop } = rules.take(record);
        if (stop) return false;
        if (row) pending.push(row);
        if (pending.length < size) return true;
        const rows = pending;
        pending = [];
        return onRows(rows);
      },
      (failure) => (failure ? reject(failure.error) : onRows(pending).then(resolve, reject)),
    );
  });
}
