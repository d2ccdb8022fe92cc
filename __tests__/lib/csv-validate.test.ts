import { SPEC_CSV_COLUMNS, naturalKey, validateSpecCsv, type SpecCsvColumn } from '@/lib/csv';

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
const quote = (v: string) => (/[",\r\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v);
const record = (over: Partial<Record<SpecCsvColumn, string>> = {}) =>
  SPEC_CSV_COLUMNS.map((c) => quote(over[c] ?? VALID[c])).join(',');
const file = (...records: string[]) => [SPEC_CSV_COLUMNS.join(','), ...records].join('\r\n') + '\r\n';

describe('lib/csv validateSpecCsv', () => {
  it('when every row is valid, accepts them all with their lines', () => {
    const result = validateSpecCsv(
      file(
        record(),
        record({ component: 'stator', parameter: 'stator winding resistance', min: '0.2', nominal: '', max: '0.6' }),
      ),
    );
    expect(result.fileErrors).toEqual([]);
    expect(result.rejected).toEqual([]);
    expect(result.accepted.map((a) => [a.line, a.row.component])).toEqual([
      [2, 'ignition coil'],
      [3, 'stator'],
    ]);
  });

  it('when a multi-line cell comes first, reports a later bad row on its physical line', () => {
    const result = validateSpecCsv(
      file(record({ notes: 'one\r\ntwo\r\nthree' }), record({ min: '4.2', nominal: '', max: '3.6' })),
    );
    expect(result.rejected).toEqual([{ line: 5, column: 'min', reason: 'min 4.2 is greater than max 3.6' }]);
  });

  it('when the same spec appears twice with the same values, rejects the second as a duplicate naming the first', () => {
    const result = validateSpecCsv(file(record(), record({ component: 'stator' }), record()));
    expect(result.accepted.map((a) => a.line)).toEqual([2, 3]);
    expect(result.rejected).toEqual([{ line: 4, column: null, reason: expect.stringMatching(/^duplicate of line 2/) }]);
  });

  it('when the same spec appears again with different values, rejects the later lines as conflicts with the first', () => {
    const result = validateSpecCsv(
      file(record(), record({ max: '3.7' }), record({ make: ' KESTREL  moto ', notes: 'newer manual' })),
    );
    expect(result.accepted.map((a) => a.line)).toEqual([2]);
    expect(result.rejected).toEqual([
      { line: 3, column: 'max', reason: expect.stringMatching(/^conflicts with line 2: .* different max$/) },
      { line: 4, column: 'notes', reason: expect.stringMatching(/^conflicts with line 2: .* different notes$/) },
    ]);
  });

  it('when rows differ only in year_to or variant, treats them as different specs', () => {
    const result = validateSpecCsv(file(record(), record({ year_to: '' }), record({ variant: '898 cc US' })));
    expect(result.rejected).toEqual([]);
    expect(result.accepted).toHaveLength(3);
  });

  it('when a row has too many cells, rejects that row and accepts the others', () => {
    const result = validateSpecCsv(file(record(), `${record({ component: 'x' })},surplus`, record({ component: 'y' })));
    expect(result.fileErrors).toEqual([]);
    expect(result.rejected).toEqual([
      {
        line: 3,
        column: null,
        reason: `this row has ${SPEC_CSV_COLUMNS.length + 1} cells but the header has ${SPEC_CSV_COLUMNS.length} columns; a value that contains a comma must be put in double quotes`,
      },
    ]);
    expect(result.accepted.map((a) => a.line)).toEqual([2, 4]);
  });

  it('when the header is broken, reports a file error and validates no rows', () => {
    const result = validateSpecCsv(`${SPEC_CSV_COLUMNS.join(';')}\r\n${record()}\r\n`);
    expect(result.fileErrors).toEqual([
      expect.objectContaining({ line: 1, reason: expect.stringMatching(/use commas/) }),
    ]);
    expect(result.accepted).toEqual([]);
    expect(result.rejected).toEqual([]);
  });

  it('when some rows are rejected, accepts the others and lists problems by line', () => {
    const result = validateSpecCsv(
      file(record({ unit: 'ohmz' }), record({ component: 'b' }), record({ component: 'c', year_from: '' })),
    );
    expect(result.rejected.map((p) => [p.line, p.column])).toEqual([
      [2, 'unit'],
      [4, 'year_from'],
    ]);
    expect(result.accepted.map((a) => a.line)).toEqual([3]);
  });

  it('when a value is implausible, accepts the row and carries the warning', () => {
    const result = validateSpecCsv(file(record({ min: '', nominal: '32', max: '' })));
    expect(result.accepted[0].warnings).toEqual([expect.objectContaining({ line: 2, column: 'nominal' })]);
  });
});

describe('lib/csv naturalKey', () => {
  const key = {
    make: 'Kestrel Moto',
    model: '900 Trail',
    yearFrom: 2016,
    yearTo: 2021 as number | null,
    variant: '898 cc',
    component: 'ignition coil',
    parameter: 'primary winding resistance',
  };

  it('ignores case and runs of whitespace', () => {
    expect(naturalKey({ ...key, make: '  kestrel   MOTO ', component: 'Ignition\tCoil' })).toBe(naturalKey(key));
  });

  it.each([
    ['make', 'Ridgeback'],
    ['model', '900 Road'],
    ['yearFrom', 2017],
    ['yearTo', null],
    ['variant', ''],
    ['component', 'stator'],
    ['parameter', 'secondary winding resistance'],
  ])('changes when %s changes', (field, value) => {
    expect(naturalKey({ ...key, [field]: value })).not.toBe(naturalKey(key));
  });

  it('does not let one field run into the next', () => {
    expect(naturalKey({ ...key, make: 'Kestrel', model: 'Moto 900 Trail' })).not.toBe(
      naturalKey({ ...key, make: 'Kestrel Moto', model: '900 Trail' }),
    );
  });
});
