/**
 * The spec-table CSV format (DESIGN.md §5): column names, which ones are required,
 * the column reference shown on the import screen, and the row / problem types.
 */
import type { CanonicalUnit } from '../units';

export const SPEC_CSV_COLUMNS = [
  'make',
  'model',
  'year_from',
  'year_to',
  'variant',
  'component',
  'parameter',
  'min',
  'nominal',
  'max',
  'unit',
  'ref_temp_c',
  'material',
  'test_points',
  'conditions',
  'source_title',
  'source_edition',
  'source_page',
  'source_url',
  'notes',
] as const;

export type SpecCsvColumn = (typeof SPEC_CSV_COLUMNS)[number];

/** Columns whose cell must not be empty (besides "at least one of min / nominal / max"). */
export const REQUIRED_COLUMNS: readonly SpecCsvColumn[] = [
  'make',
  'model',
  'year_from',
  'component',
  'parameter',
  'unit',
  'source_title',
  'source_page',
];

/** Written as plain numbers on export and never neutralised (a negative number is a number). */
export const NUMERIC_COLUMNS: readonly SpecCsvColumn[] = [
  'year_from',
  'year_to',
  'min',
  'nominal',
  'max',
  'ref_temp_c',
];

/** The columns that make up a row's natural key (the identity used to match re-imports). */
export const KEY_COLUMNS: readonly SpecCsvColumn[] = [
  'make',
  'model',
  'year_from',
  'year_to',
  'variant',
  'component',
  'parameter',
];

export type SpecCsvRow = {
  make: string;
  model: string;
  yearFrom: number;
  yearTo: number | null;
  variant: string;
  component: string;
  parameter: string;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: CanonicalUnit;
  refTempC: number | null;
  material: 'copper' | 'none';
  testPoints: string;
  conditions: string;
  sourceTitle: string;
  sourceEdition: string;
  sourcePage: string;
  sourceUrl: string | null;
  notes: string;
};

/** One problem with a file or a row. `line` is the physical 1-based line (the header is line 1). */
export type RowProblem = { line: number; column: SpecCsvColumn | null; reason: string };

/** CSV column → SpecCsvRow property, in column order. */
export const COLUMN_TO_FIELD: Record<SpecCsvColumn, keyof SpecCsvRow> = {
  make: 'make',
  model: 'model',
  year_from: 'yearFrom',
  year_to: 'yearTo',
  variant: 'variant',
  component: 'component',
  parameter: 'parameter',
  min: 'min',
  nominal: 'nominal',
  max: 'max',
  unit: 'unit',
  ref_temp_c: 'refTempC',
  material: 'material',
  test_points: 'testPoints',
  conditions: 'conditions',
  source_title: 'sourceTitle',
  source_edition: 'sourceEdition',
  source_page: 'sourcePage',
  source_url: 'sourceUrl',
  notes: 'notes',
};

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
