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

/** The spec fields the CSV format carries (lib/contracts/spec-fields.ts), in column order. */
export const CSV_FIELDS = [
  ...SPEC_FIELDS.filter((f) => f.csv !== null && !hasFlag(f, 'csvLast')),
  ...SPEC_FIELDS.filter((f) => f.csv !== null && hasFlag(f, 'csvLast')),
] as Extract<SpecField, { csv: string }>[];
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

type CellOf<F extends CsvField> = F['kind'] extends 'text'
  ? 'csvEmptyIsNull' extends F['flags'][number]
    ? string | null
    : string
  : (SpecSnapshot & { sourceUrl: string | null })[F['key']];

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
  describe(
    'parameter',
    'What is measured, up to 120 characters. Known parameters are checked against the unit.',
    'primary winding resistance',
  ),
  describe(
    'min',
    'Lowest acceptable value, a plain number with a dot as decimal separator. Give at least one of min, nominal or max.',
    '2.9',
  ),
  describe('nominal', 'Nominal (rated) value; must lie between min and max when they are given.', '3.2'),
  describe('max', 'Highest acceptable value; not below min.', '3.5'),
  describe('unit', 'Unit of min / nominal / max: Ω (or ohm), kΩ, MΩ, V, mV, A, mA, mm, in, thou (or mil).', 'Ω'),
  describe('ref_temp_c', 'Temperature (°C, −40 to 200) the limits refer to; empty means 20 °C for windings.', '20'),
  describe(
    'material',
    'Winding material: copper or none. Empty means copper for winding and coil resistances, none otherwise.',
    'copper',
  ),
  describe('test_points', 'Where to put the meter probes, up to 1000 characters.', 'orange/white (+) to ground'),
  describe(
    'conditions',
    'Meter range, engine temperature and other conditions, up to 1000 characters.',
    'meter on 200 Ω range, engine cold (20 °C)',
  ),
  describe(
    'source_title',
    'Title of the document the values come from, up to 200 characters.',
    'Kestrel Moto Service Manual 900 series',
  ),
  describe('source_edition', 'Edition or revision of the source, up to 200 characters.', '3rd edition'),
  describe('source_page', 'Page or section in the source, up to 200 characters.', '7-12'),
  describe(
    'source_url',
    'Link to the source, http:// or https://, up to 500 characters; may be empty.',
    'https://manuals.specbench.example/kestrel/900',
  ),
  describe(
    'notes',
    'Anything else the technician should know, up to 1000 characters.',
    'Disconnect the battery first.',
  ),
];
