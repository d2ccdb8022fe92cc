import { SpecCsvRowSchema, validateSpecRow, type SpecCsvColumn } from '@/lib/csv';

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
  material: '',
  test_points: 'orange/white (+) to ground',
  conditions: '',
  source_title: 'Kestrel Moto Service Manual',
  source_edition: 'Rev. B',
  source_page: '7-12',
  source_url: '',
  notes: '',
};
const LINE = 7;
const check = (over: Partial<Record<SpecCsvColumn, string>>) => validateSpecRow({ ...VALID, ...over }, LINE);
const accepted = (over: Partial<Record<SpecCsvColumn, string>>) => {
  const result = check(over);
  if (!result.ok) throw new Error(`expected the row to be accepted: ${JSON.stringify(result.errors)}`);
  return result;
};

describe('lib/csv validateSpecRow rejections', () => {
  it.each(['make', 'model', 'year_from', 'component', 'parameter', 'unit', 'source_title', 'source_page'] as const)(
    'when %s is empty, rejects the row saying it is required',
    (column) => {
      expect(check({ [column]: '  ' })).toEqual({
        ok: false,
        errors: [{ line: LINE, column, reason: `${column} is required` }],
      });
    },
  );

  it.each<[string, Partial<Record<SpecCsvColumn, string>>, SpecCsvColumn | null, RegExp]>([
    ['no limits at all', { min: '', nominal: '', max: '' }, null, /give at least one of min, nominal or max/],
    ['a decimal comma', { min: '3,5', nominal: '', max: '' }, 'min', /use a dot as the decimal separator \(3\.5\)/],
    ['a word for a number', { max: 'abc' }, 'max', /max "abc" is not a number/],
    ['a unit inside the number', { nominal: '3.2 Ω' }, 'nominal', /put the unit in the unit column/],
    ['NaN', { min: 'NaN' }, 'min', /min "NaN" is not a finite number/],
    ['Infinity', { max: 'Infinity' }, 'max', /not a finite number/],
    ['an overflowing 1e999', { max: '1e999' }, 'max', /not a finite number/],
    ['min above max', { min: '4.2', nominal: '', max: '3.6' }, 'min', /^min 4\.2 is greater than max 3\.6$/],
    ['nominal above max', { nominal: '3.8' }, 'nominal', /^nominal 3\.8 is greater than max 3\.5$/],
    ['nominal below min', { nominal: '2.1' }, 'nominal', /^nominal 2\.1 is less than min 2\.9$/],
    ['year_from before 1900', { year_from: '1899' }, 'year_from', /year_from 1899 is outside 1900 to 2100/],
    ['year_from after 2100', { year_from: '2101', year_to: '' }, 'year_from', /outside 1900 to 2100/],
    ['a fractional year', { year_from: '2016.5' }, 'year_from', /not a whole year/],
    ['a year that is not a number', { year_to: 'now' }, 'year_to', /year_to "now" is not a year/],
    ['year_to before year_from', { year_to: '2015' }, 'year_to', /^year_to 2015 is before year_from 2016$/],
    [
      'an unknown unit',
      { unit: 'furlong' },
      'unit',
      /unit "furlong" is not recognised; use one of Ω \(or ohm\), kΩ, MΩ, V, mV, A, mA, mm, in, thou/,
    ],
    [
      'a gap in ohms',
      { parameter: 'electrode gap', min: '0.6', nominal: '', max: '0.7' },
      'unit',
      /^unit Ω is a resistance unit but parameter 'electrode gap' needs a length unit$/,
    ],
    [
      'a rest voltage in amps',
      { parameter: 'rest voltage', unit: 'A', min: '12.5', nominal: '', max: '' },
      'unit',
      /needs a voltage unit/,
    ],
    [
      'a fuse rating in volts',
      { parameter: 'fuse rating', unit: 'V', min: '', nominal: '15', max: '' },
      'unit',
      /needs a current unit/,
    ],
    ['ref_temp_c above 200', { ref_temp_c: '250' }, 'ref_temp_c', /ref_temp_c 250 is outside -40 to 200 °C/],
    ['ref_temp_c below -40', { ref_temp_c: '-41' }, 'ref_temp_c', /outside -40 to 200/],
    [
      'an unknown material',
      { material: 'aluminium' },
      'material',
      /material "aluminium" is not allowed; use copper, none/,
    ],
    ['a 121-character make', { make: 'k'.repeat(121) }, 'make', /make is 121 characters long; the limit is 120/],
    ['a 121-character parameter', { parameter: 'p'.repeat(121) }, 'parameter', /the limit is 120/],
    ['1001 characters of notes', { notes: 'n'.repeat(1001) }, 'notes', /the limit is 1000/],
    ['1001 characters of test points', { test_points: 't'.repeat(1001) }, 'test_points', /the limit is 1000/],
    ['a 201-character source title', { source_title: 's'.repeat(201) }, 'source_title', /the limit is 200/],
    [
      'a url that is not http(s)',
      { source_url: 'ftp://manuals.specbench.example/a' },
      'source_url',
      /http:\/\/ or https:\/\//,
    ],
    ['a javascript: url', { source_url: 'javascript:alert(1)' }, 'source_url', /http:\/\/ or https:\/\//],
    [
      'a 501-character url',
      { source_url: `https://manuals.specbench.example/${'a'.repeat(467)}` },
      'source_url',
      /the limit is 500/,
    ],
    ['a negative resistance', { min: '-1' }, 'min', /min -1 is negative; a resistance cannot be below zero/],
    ['a control character', { notes: 'bell\u0007' }, 'notes', /invisible control character/],
    [
      'a line break in a one-line column',
      { component: 'ignition\ncoil' },
      'component',
      /component must fit on one line/,
    ],
  ])('when given %s, rejects it with the column and a plain reason', (_name, over, column, reason) => {
    const result = check(over);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors).toContainEqual({ line: LINE, column, reason: expect.stringMatching(reason) });
  });
});

describe('lib/csv validateSpecRow accepted cells', () => {
  it.each(['=cmd|calc', '+ terminal', '-ve lead', '@ idle'])('keeps the text %j as text, exactly', (text) => {
    expect(accepted({ test_points: text }).row.testPoints).toBe(text);
  });

  it.each([
    ["'=cmd", '=cmd'],
    ["'-ve lead", '-ve lead'],
    ["'hello", "'hello"],
    ["''=x", "'=x"],
  ])('when a cell reads %j, strips one neutralising quote only before a formula character → %j', (cell, stored) => {
    expect(accepted({ notes: cell }).row.notes).toBe(stored);
  });

  it.each([
    ['primary winding resistance', 'Ω', 'copper'],
    ['stator winding resistance', 'Ω', 'copper'],
    ['pickup coil resistance', 'Ω', 'copper'],
    ['plug cap resistance', 'kΩ', 'none'],
    ['plug lead resistance', 'kΩ', 'none'],
    ['electrode gap', 'mm', 'none'],
  ])('when material is empty, the parameter is %s and the unit %s, defaults it to %s', (parameter, unit, material) => {
    expect(accepted({ parameter, unit, min: '0.5', nominal: '', max: '0.9' }).row.material).toBe(material);
  });

  it('when material is given, keeps it (case-insensitive)', () => {
    expect(accepted({ material: 'NONE' }).row.material).toBe('none');
  });

  it.each([
    ['ohm', 'Ω'],
    ['kohm', 'kΩ'],
    ['mil', 'thou'],
    [' mm ', 'mm'],
  ])('when the unit is %j, stores %j', (unit, stored) => {
    const parameter = stored === 'mm' || stored === 'thou' ? 'electrode gap' : 'resistance';
    expect(accepted({ unit, parameter }).row.unit).toBe(stored);
  });

  it.each([
    ['.5', 0.5],
    ['+3', 3],
    ['1e3', 1000],
    [' 4.25 ', 4.25],
  ])('reads the number %j as %d', (text, value) => {
    expect(accepted({ parameter: 'resistance', min: '', nominal: text, max: '' }).row.nominal).toBe(value);
  });

  it('when optional cells are empty or the columns are absent, gives nulls and empty text', () => {
    const { make, model, year_from, component, parameter, max, unit, source_title, source_page } = VALID;
    const result = validateSpecRow(
      { make, model, year_from, component, parameter, max, unit, source_title, source_page },
      LINE,
    );
    expect(result).toEqual(expect.objectContaining({ ok: true }));
    if (result.ok)
      expect(result.row).toEqual(
        expect.objectContaining({
          yearTo: null,
          min: null,
          nominal: null,
          refTempC: null,
          sourceUrl: null,
          variant: '',
          notes: '',
        }),
      );
  });

  it('exposes the same rules as a zod schema whose issues name the column', () => {
    const result = SpecCsvRowSchema.safeParse({ ...VALID, year_to: '2015' });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].path).toEqual(['year_to']);
    expect(SpecCsvRowSchema.parse(VALID).yearFrom).toBe(2016);
  });
});

describe('lib/csv validateSpecRow plausibility warnings', () => {
  // The ranges are from memory, low confidence (REFERENCES.md §7): warnings only, never rejections.
  it.each<[string, Partial<Record<SpecCsvColumn, string>>, SpecCsvColumn[]]>([
    ['a 25 Ω primary winding', { min: '', nominal: '25', max: '' }, ['nominal']],
    ['a primary winding written in kΩ by mistake', { unit: 'kΩ' }, ['min', 'nominal', 'max']],
    [
      'a 0.5 kΩ secondary winding',
      { parameter: 'secondary winding resistance', unit: 'kΩ', min: '0.5', nominal: '', max: '0.9' },
      ['min', 'max'],
    ],
    [
      'a 150 kΩ secondary winding',
      { parameter: 'secondary winding resistance', unit: 'kΩ', min: '', nominal: '150', max: '' },
      ['nominal'],
    ],
    [
      'a 10 Ω pickup coil',
      { component: 'pickup coil', parameter: 'resistance', min: '', nominal: '10', max: '' },
      ['nominal'],
    ],
    ['a plausible primary winding', {}, []],
    [
      'a plausible secondary winding',
      { parameter: 'secondary winding resistance', unit: 'kΩ', min: '6', nominal: '', max: '9' },
      [],
    ],
    [
      'a plausible pulse generator',
      { component: 'pulse generator', parameter: 'resistance', min: '300', nominal: '', max: '500' },
      [],
    ],
  ])('when given %s, accepts it with warnings on %j', (_name, over, columns) => {
    const result = accepted(over);
    expect(result.warnings.map((w) => w.column)).toEqual(columns);
    result.warnings.forEach((w) =>
      expect(w).toEqual({
        line: LINE,
        column: w.column,
        reason: expect.stringMatching(/is unusual for .*check the value and the unit/),
      }),
    );
  });
});
