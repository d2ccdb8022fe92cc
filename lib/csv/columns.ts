/**
 * The spec-table CSV format (DESIGN.md §5): column names, which ones are required,
 * the column reference shown on the import screen, and the row / problem types.
 */
import { SPEC_FIELDS, hasFlag, type SpecField, type SpecSnapshot } from '../contracts/spec-fields';

/** The columns that place a spec in the library (make, model, years, variant, component). */
export const IDENTITY_COLUMNS = ['make', 'model', 'year_from', 'year_to', 'variant', 'component'] as const;
type IdentityColumn = (typeof IDENTITY_COLUMNS)[number];
type IdentityRow = {
  make: string;
  model: string;
  yearFrom: number;
  yearTo: number | null;
  variant: string;
  component: string;
};
const IDENTITY_FIELD: Record<IdentityColumn, keyof IdentityRow> = {
  make: 'make',
  model: 'model',
  year_from: 'yearFrom',
  year_to: 'yearTo',
  variant: 'variant',
  component: 'component',
};

/**
 * The spec fields the CSV format carries (lib/contracts/spec-fields.ts), in column order:
 * the original columns, then the ones added later (csvOptional, so files and sheets made
 * before them keep their columns where they were), then the free text that closes a record.
 */
const csvRank = (f: SpecField) => (hasFlag(f, 'csvLast') ? 2 : hasFlag(f, 'csvOptional') ? 1 : 0);
export const CSV_FIELDS = SPEC_FIELDS.filter((f) => f.csv !== null)
  .map((f, i) => ({ f, i }))
  .sort((a, b) => csvRank(a.f) - csvRank(b.f) || a.i - b.i)
  .map(({ f }) => f) as Extract<SpecField, { csv: string }>[];
type CsvField = (typeof CSV_FIELDS)[number];

export type SpecCsvColumn = IdentityColumn | CsvField['csv'];

export const SPEC_CSV_COLUMNS: readonly SpecCsvColumn[] = [...IDENTITY_COLUMNS, ...CSV_FIELDS.map((f) => f.csv)];

/** Columns whose cell must not be empty (besides "at least one of min / nominal / max"). */
export const REQUIRED_COLUMNS: readonly SpecCsvColumn[] = [
  'make',
  'model',
  'year_from',
  'component',
  ...CSV_FIELDS.filter((f) => hasFlag(f, 'csvRequired')).map((f) => f.csv),
];

/** Written as plain numbers on export and never neutralised (a negative number is a number). */
export const NUMERIC_COLUMNS: readonly SpecCsvColumn[] = [
  'year_from',
  'year_to',
  ...CSV_FIELDS.filter((f) => f.kind === 'number').map((f) => f.csv),
];

/** The columns that make up a row's natural key (the identity used to match re-imports). */
export const KEY_COLUMNS: readonly SpecCsvColumn[] = [...IDENTITY_COLUMNS, 'parameter'];

type PresentCell<F extends CsvField> = F['kind'] extends 'text'
  ? 'csvEmptyIsNull' extends F['flags'][number]
    ? string | null
    : string
  : (SpecSnapshot & { sourceUrl: string | null })[F['key']];
/** A column added later may be missing from a file: undefined (the spec keeps its value). */
type CellOf<F extends CsvField> = 'csvOptional' extends F['flags'][number]
  ? PresentCell<F> | undefined
  : PresentCell<F>;

/** One validated CSV row: the identity, then every field the format carries (text as '' when empty). */
export type SpecCsvRow = IdentityRow & { [F in CsvField as F['key']]: CellOf<F> };

/** One problem with a file or a row. `line` is the physical 1-based line (the header is line 1). */
export type RowProblem = { line: number; column: SpecCsvColumn | null; reason: string };

/** CSV column → SpecCsvRow property, in column order. */
export const COLUMN_TO_FIELD = Object.fromEntries([
  ...IDENTITY_COLUMNS.map((c) => [c, IDENTITY_FIELD[c]]),
  ...CSV_FIELDS.map((f) => [f.csv, f.key]),
]) as Record<SpecCsvColumn, keyof SpecCsvRow>;

type ColumnInfo = { column: SpecCsvColumn; required: boolean; description: string; example: string };

const describe = (column: SpecCsvColumn, description: string, example: string): ColumnInfo => ({
  column,
  required: REQUIRED_COLUMNS.includes(column),
  description,
  example,
});

export const COLUMN_REFERENCE: ColumnInfo[] = [
  describe('make', 'Manufacturer name, up to 120 characters.', 'Kestrel Moto'),
  describe('model', 'Model name, up to 120 characters.', '900 Trail'),
  describe('year_from', 'First model year covered, a whole number from 1900 to 2100.', '2016'),
  describe('year_to', 'Last model year covered; leave empty if still current. Not before year_from.', '2021'),
  describe('variant', 'Engine size, market or other variant; may be empty.', '898 cc, EU'),
  describe('component', 'The part being checked, up to 120 characters.', 'ignition coil (rear)'),
  ...CSV_FIELDS.map((f) => describe(f.csv, ...(f.help as [string, string]))),
];
