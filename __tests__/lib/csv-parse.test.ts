import { SPEC_CSV_COLUMNS, parseSpecCsvDetailed, type SpecCsvColumn } from '@/lib/csv';

const VALID: Record<SpecCsvColumn, string> = {
  make: 'Kestrel Moto',
  model: '900 Trail',
  year_from: '2016',
  year_to: '2021',
  variant: '898 cc',
  component: 'ignition coil',
  parameter: 'primary winding resistance',
  min: '2.9',
  nominal: '3.2',
  max: '3.5',
  unit: 'Ω',
  mode: '',
  near_limit: '',
  engine_rpm: '',
  ref_temp_c: '20',
  material: 'copper',
  test_points: 'orange/white (+) to ground',
  conditions: '',
  source_title: 'Kestrel Moto Service Manual',
  source_edition: 'Rev. B',
  source_page: '7-12',
  source_url: '',
  notes: '',
};
const HEADER = SPEC_CSV_COLUMNS.join(',');
const WIDTH = SPEC_CSV_COLUMNS.length;
const quote = (v: string) => (/[",\r\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v);
const record = (over: Partial<Record<SpecCsvColumn, string>> = {}) =>
  SPEC_CSV_COLUMNS.map((c) => quote(over[c] ?? VALID[c])).join(',');

describe('lib/csv parseSpecCsvDetailed records and lines', () => {
  it.each([
    ['CRLF', '\r\n'],
    ['LF', '\n'],
  ])('when records end in %s, reads each row with its line number', (_name, eol) => {
    // Source: RFC 4180 §2 rule 1 — each record on its own line, delimited by a line break (CRLF)
    const parsed = parseSpecCsvDetailed(
      [HEADER, record({ component: 'stator' }), record({ component: 'pickup coil' })].join(eol) + eol,
    );
    expect(parsed.fileErrors).toEqual([]);
    expect(parsed.rows.map((r) => [r.line, r.raw.component])).toEqual([
      [2, 'stator'],
      [3, 'pickup coil'],
    ]);
  });

  it('when the last record has no line break, still reads it', () => {
    // Source: RFC 4180 §2 rule 2 — the last record in the file may or may not have an ending line break
    const parsed = parseSpecCsvDetailed(`${HEADER}\r\n${record()}\r\n${record({ component: 'last' })}`);
    expect(parsed.rows.map((r) => r.raw.component)).toEqual(['ignition coil', 'last']);
  });

  it.each([
    ['CRLF', '\r\n'],
    ['LF', '\n'],
  ])('when a quoted cell spans three lines (%s), the next row keeps its physical line', (_name, eol) => {
    // Source: RFC 4180 §2 rule 6 — fields containing line breaks are enclosed in double quotes
    const notes = `first${eol}second, "quoted"${eol}third`;
    const parsed = parseSpecCsvDetailed([HEADER, record({ notes }), record({ component: 'after' })].join(eol) + eol);
    expect(parsed.rows.map((r) => r.line)).toEqual([2, 5]);
    expect(parsed.rows[0].raw.notes).toBe(notes);
  });

  it('when blank lines sit between rows, skips them but counts them in line numbers', () => {
    const parsed = parseSpecCsvDetailed(
      `${HEADER}\r\n\r\n${record()}\r\n,,,,,,,,,,,,,,,,,,,\r\n${record({ component: 'x' })}\r\n\r\n`,
    );
    expect(parsed.rows.map((r) => r.line)).toEqual([3, 5]);
    expect(parsed.fileErrors).toEqual([]);
  });

  it('when the file starts with a UTF-8 BOM, reads the first column name correctly', () => {
    const parsed = parseSpecCsvDetailed(`\uFEFF${HEADER}\r\n${record()}\r\n`);
    expect(parsed.fileErrors).toEqual([]);
    expect(parsed.rows[0].raw.make).toBe('Kestrel Moto');
  });

  it('when header names differ in case and spacing, maps them to the columns', () => {
    const header = SPEC_CSV_COLUMNS.map((c) => ` ${c.replace('_', ' ').toUpperCase()} `).join(',');
    const parsed = parseSpecCsvDetailed(`${header}\n${record()}\n`);
    expect(parsed.fileErrors).toEqual([]);
    expect(parsed.rows[0].raw.year_from).toBe('2016');
  });

  it('when optional columns are left out of the header, reads the rest', () => {
    const parsed = parseSpecCsvDetailed(
      'make,model,year_from,component,parameter,max,unit,source_title,source_page\n' +
        'Ridgeback,R4,2019,main fuse,fuse rating,30,A,Ridgeback Manual,9-1\n',
    );
    expect(parsed.fileErrors).toEqual([]);
    expect(parsed.rows[0].raw).toEqual(expect.objectContaining({ make: 'Ridgeback', max: '30', unit: 'A' }));
  });
});

const withoutColumns = (...drop: string[]) => SPEC_CSV_COLUMNS.filter((c) => !drop.includes(c));

describe('lib/csv parseSpecCsvDetailed file-level problems', () => {
  it.each([
    ['an empty file', '', 1, /file is empty/],
    ['a file of blank lines', ' \r\n\r\n', 1, /file is empty/],
    ['a header with no rows', `${HEADER}\r\n`, 1, /no data rows/],
    [
      'missing required columns',
      `${withoutColumns('make', 'source_page').join(',')}\r\nx\r\n`,
      1,
      /missing required columns: make, source_page/,
    ],
    [
      'no min, nominal or max column',
      `${withoutColumns('min', 'nominal', 'max').join(',')}\r\nx\r\n`,
      1,
      /at least one of the columns min, nominal or max/,
    ],
    ['unknown columns', `${HEADER},colour,torque\r\n${record()},a,b\r\n`, 1, /unknown columns: colour, torque/],
    ['a duplicated column', `${HEADER},notes\r\n${record()},\r\n`, 1, /notes appears more than once/],
    [
      'a semicolon-separated file',
      `${SPEC_CSV_COLUMNS.join(';')}\r\n1;2\r\n`,
      1,
      /separated by semicolons; use commas/,
    ],
    ['a tab-separated file', `${SPEC_CSV_COLUMNS.join('\t')}\r\n1\t2\r\n`, 1, /separated by tabs; use commas/],
    ['an unclosed quote in the header', `make,"model\r\n${record()}\r\n`, 1, /never closed/],
    [
      'an unclosed quote on line 3',
      `${HEADER}\r\n${record()}\r\n${record({ notes: 'x' }).replace(/,x$/, ',"x')}\r\n${record()}\r\n`,
      3,
      /never closed/,
    ],
    [
      'text after a closing quote on line 2',
      `${HEADER}\r\n${record().replace(',Kestrel Moto Service Manual,', ',"Kestrel" Service,')}\r\n`,
      2,
      /after its closing quote/,
    ],
  ])('when given %s, reports it on line %d', (_name, text, line, reason) => {
    const parsed = parseSpecCsvDetailed(text);
    expect(parsed.fileErrors).toContainEqual(expect.objectContaining({ line, reason: expect.stringMatching(reason) }));
  });

  it.each([
    [
      'too many cells on line 3',
      `${HEADER}\r\n${record()}\r\n${record()},extra\r\n`,
      3,
      new RegExp(
        `${WIDTH + 1} cells but the header has ${WIDTH} columns; a value that contains a comma must be put in double quotes`,
      ),
    ],
    [
      'too few cells on line 2',
      `${HEADER}\r\n${record().replace(/,[^,]*,[^,]*$/, '')}\r\n`,
      2,
      new RegExp(`${WIDTH - 2} cells but the header has ${WIDTH} columns`),
    ],
  ])('when given %s, reports it as a row problem on line %d and the file stays usable', (_name, text, line, reason) => {
    const parsed = parseSpecCsvDetailed(text);
    expect(parsed.fileErrors).toEqual([]);
    expect(parsed.rowErrors).toEqual([
      expect.objectContaining({ line, column: null, reason: expect.stringMatching(reason) }),
    ]);
  });

  it('when a header problem is found, returns no rows', () => {
    expect(parseSpecCsvDetailed(`${HEADER},colour\r\n${record()},red\r\n`).rows).toEqual([]);
  });

  it('when one row has too many cells, leaves it out and keeps the others', () => {
    const parsed = parseSpecCsvDetailed(
      `${HEADER}\r\n${record()}\r\n${record()},extra\r\n${record({ component: 'x' })}\r\n`,
    );
    expect(parsed.rows.map((r) => r.line)).toEqual([2, 4]);
  });

  it('when surplus cells are all empty (trailing commas), accepts the row', () => {
    const parsed = parseSpecCsvDetailed(`${HEADER}\r\n${record()},,\r\n`);
    expect(parsed.fileErrors).toEqual([]);
    expect(parsed.rows).toHaveLength(1);
  });
});
