/**
 * The benchmark's invented library as CSV in the import format: makes × models × ten specs
 * (coil windings, pickup, stator, plug gap, battery, regulator, fuse). Every name and value
 * is invented; the values only need to pass validation, so they vary a little per model.
 */
import { SPEC_CSV_COLUMNS, type SpecCsvColumn } from '@/lib/csv';

type Spec = [
  component: string,
  parameter: string,
  min: number | '',
  nominal: number | '',
  max: number | '',
  unit: string,
  refTemp: number | '',
  material: string,
  testPoints: string,
];

const SPECS: Spec[] = [
  ['ignition coil', 'primary winding resistance', 2.4, 2.8, 3.2, 'Ω', 20, 'copper', 'orange/white (+) to ground'],
  [
    'ignition coil',
    'secondary winding resistance',
    8.5,
    9.5,
    10.5,
    'kΩ',
    20,
    'copper',
    'HT lead core to ground, cap removed',
  ],
  ['pickup coil', 'pickup coil resistance', 400, 480, 560, 'Ω', 20, 'copper', 'blue/yellow to green/white'],
  ['pickup coil', 'pickup coil air gap', 0.5, 0.7, 0.9, 'mm', '', 'none', 'rotor tooth to pickup face'],
  ['stator', 'stator winding resistance', 0.2, 0.3, 0.4, 'Ω', 20, 'copper', 'yellow to yellow, each pair'],
  ['stator', 'unloaded AC output voltage', 50, '', '', 'V', '', 'none', 'yellow to yellow at 5000 rpm'],
  ['spark plug', 'electrode gap', 0.8, 0.85, 0.9, 'mm', '', 'none', 'centre to ground electrode'],
  ['battery', 'rest voltage', 12.6, '', '', 'V', '', 'none', 'battery terminals, 6 h after charging'],
  ['regulator / rectifier', 'regulated voltage', 13.5, 14.2, 14.8, 'V', '', 'none', 'battery terminals at 5000 rpm'],
  ['main fuse', 'fuse rating', '', 30, '', 'A', '', 'none', 'fuse box under the seat'],
];

/** RFC 4180 quoting where a cell needs it (both the importer and LOAD DATA read it). */
const cell = (value: string | number) =>
  /[",\r\n]/.test(String(value)) ? `"${String(value).replace(/"/g, '""')}"` : String(value);

type CsvRow = Partial<Record<SpecCsvColumn, string | number>>;

/** One row as a CSV line of `columns` (a column the row does not name is left empty). */
const csvLine = (columns: readonly SpecCsvColumn[], row: CsvRow) => columns.map((c) => cell(row[c] ?? '')).join(',');

const FAMILIES = ['Trail', 'Urban', 'Ridge', 'Drift', 'Surge', 'Vela', 'Strale', 'Moor', 'Quill', 'Fen'];

/** Varies a value by model (±5 %), keeping min ≤ nominal ≤ max. */
const vary = (value: number | '', model: number) =>
  value === '' ? '' : Number((value * (1 + ((model % 11) - 5) / 100)).toPrecision(4));

export function makeBenchCsv(rows: number, makePrefix = 'Benchmake'): string {
  const lines = [SPEC_CSV_COLUMNS.join(',')];
  for (let model = 0; lines.length <= rows; model += 1) {
    const make = `${makePrefix} ${String(model % 50).padStart(2, '0')}`;
    const name = `${FAMILIES[model % FAMILIES.length]} ${100 + model}`;
    const yearFrom = 1995 + (model % 25);
    for (const [component, parameter, min, nominal, max, unit, refTemp, material, testPoints] of SPECS) {
      if (lines.length > rows) break;
      // By column name, written in the import format's own column order (lib/csv/columns.ts);
      // a column not named here (mode, near limit, engine speed, notes) is left empty.
      const row: CsvRow = {
        make,
        model: name,
        year_from: yearFrom,
        year_to: yearFrom + 4,
        variant: model % 3 === 0 ? 'EU' : 'US',
        component,
        parameter,
        min: vary(min, model),
        nominal: vary(nominal, model),
        max: vary(max, model),
        unit,
        ref_temp_c: refTemp,
        material,
        test_points: testPoints,
        conditions: 'engine cold',
        source_title: `${make} Service Manual`,
        source_edition: '2nd edition',
        source_page: `${1 + (model % 9)}-${10 + (model % 40)}`,
      };
      lines.push(csvLine(SPEC_CSV_COLUMNS, row));
    }
  }
  return lines.join('\r\n') + '\r\n';
}

/**
 * The largest file the importer accepts: `rows` rows (the row limit) of short specs in the
 * required columns only (and min, max), each padded in its test points so that the file
 * comes to just under `bytes` (the upload limit). Models × components make every natural key
 * distinct.
 */
export function makeLargestCsv(rows: number, bytes: number, make: string): string {
  const cells = (i: number, pad: string): CsvRow => ({
    make,
    model: `L${i % 1000}`,
    year_from: 2001,
    component: `p${Math.floor(i / 1000)}`,
    parameter: 'r',
    min: 1,
    max: 2,
    unit: 'Ω',
    test_points: pad,
    source_title: 'BM',
    source_page: '1',
  });
  const columns = SPEC_CSV_COLUMNS.filter((c) => c in cells(0, ''));
  const line = (i: number, pad: string) => csvLine(columns, cells(i, pad));
  const header = columns.join(',');
  // Bytes a row may take, less what the longest unpadded row (the last) already takes.
  const room = Math.floor((bytes - header.length - 2) / rows) - 2 - Buffer.byteLength(line(rows - 1, ''));
  if (room < 0) throw new Error(`${rows} rows of the shortest specs do not fit in ${bytes} bytes`);
  const pad = 'x'.repeat(room);
  return [header, ...Array.from({ length: rows }, (_, i) => line(i, pad))].join('\r\n') + '\r\n';
}
