import fc from 'fast-check';
import { SPEC_CSV_COLUMNS, neutraliseCell, toSpecCsv, validateSpecCsv, type SpecCsvRow } from '@/lib/csv';

const BASE: SpecCsvRow = {
  make: 'Kestrel Moto',
  model: '900 Trail',
  yearFrom: 2016,
  yearTo: 2021,
  variant: '898 cc EU',
  component: 'ignition coil (rear)',
  parameter: 'primary winding resistance',
  min: 2.9,
  nominal: 3.2,
  max: 3.5,
  unit: 'Ω',
  mode: null,
  nearLimit: null,
  engineRpm: null,
  refTempC: 20,
  material: 'copper',
  testPoints: 'orange/white (+) to ground',
  conditions: 'meter on 200 Ω range',
  sourceTitle: 'Kestrel Moto Service Manual 900 series',
  sourceEdition: '3rd edition',
  sourcePage: '7-12',
  sourceUrl: null,
  notes: '',
};

/** The record after the header (notes is the last column, so its field ends the record). */
const firstRecord = (row: SpecCsvRow) => toSpecCsv([row]).slice(SPEC_CSV_COLUMNS.join(',').length + 2);

describe('lib/csv toSpecCsv (RFC 4180 §2)', () => {
  it.each([
    // Source: RFC 4180 §2 rule 7 — a double quote inside a quoted field is doubled
    ['b"bb', '"b""bb"'],
    // Source: RFC 4180 §2 rule 6 — fields containing commas are enclosed in double quotes
    ['a,b', '"a,b"'],
    // Source: RFC 4180 §2 rule 6 — fields containing line breaks are enclosed in double quotes
    ['line one\r\nline two', '"line one\r\nline two"'],
    ['line one\nline two', '"line one\nline two"'],
    ['plain text', 'plain text'],
  ])('writes the notes cell %j as the field %j', (notes, field) => {
    expect(firstRecord({ ...BASE, notes })).toMatch(new RegExp(`,${escapeRe(field)}\\r\\n$`));
  });

  it('when given two rows, writes the header and ends every record with CRLF', () => {
    // Source: RFC 4180 §2 rules 1 and 3 — CRLF line breaks, optional header line with the same format
    const csv = toSpecCsv([
      BASE,
      { ...BASE, parameter: 'secondary winding resistance', unit: 'kΩ', min: 6, nominal: 7, max: 9 },
    ]);
    const records = csv.split('\r\n');
    expect(records[0]).toBe(SPEC_CSV_COLUMNS.join(','));
    expect(records).toHaveLength(4);
    expect(records[3]).toBe('');
    expect(csv.replace(/\r\n/g, '')).not.toMatch(/\n/);
  });

  it('writes absent numbers and a null url as empty cells', () => {
    const record = firstRecord({ ...BASE, yearTo: null, min: null, max: null, refTempC: null, sourceUrl: null });
    expect(record).toBe(
      'Kestrel Moto,900 Trail,2016,,898 cc EU,ignition coil (rear),primary winding resistance,,3.2,,Ω,,copper,' +
        'orange/white (+) to ground,meter on 200 Ω range,Kestrel Moto Service Manual 900 series,3rd edition,7-12,,,,,\r\n',
    );
  });
});

describe('lib/csv neutraliseCell (formula injection)', () => {
  // Source: OWASP CSV Injection; OWASP ASVS 5.0 1.2.10; CWE-1236
  it.each(['=1+2', '+1', '-1', '@SUM(A1)', '\tx', '\rx', '\0x', "'=x"])('prefixes %j with a single quote', (value) => {
    expect(neutraliseCell(value)).toBe(`'${value}`);
  });

  it.each(['abc', '1-2', "'t was", "'", 'a=b', ''])('leaves %j unchanged', (value) => {
    expect(neutraliseCell(value)).toBe(value);
  });

  // Source: OWASP CSV Injection; OWASP ASVS 5.0 1.2.10; CWE-1236 — prefix with ' and quote the field
  it.each([
    ['=HYPERLINK("http://x.example")', '"\'=HYPERLINK(""http://x.example"")"'],
    ['@cmd', '"\'@cmd"'],
    ['-5 V offset', '"\'-5 V offset"'],
  ])('exports the text cell %j as %j', (notes, field) => {
    expect(firstRecord({ ...BASE, notes })).toMatch(new RegExp(`,${escapeRe(field)}\\r\\n$`));
  });

  it('when a numeric column is negative, writes a plain number, not an escaped cell', () => {
    const record = firstRecord({
      ...BASE,
      parameter: 'peak voltage',
      unit: 'V',
      min: -0.5,
      nominal: null,
      max: 2,
      refTempC: -20,
    });
    expect(record).toContain(',-0.5,,2,V,-20,');
    expect(record).not.toContain("'-");
  });
});

describe('lib/csv export → import round trip', () => {
  const tricky: SpecCsvRow[] = [
    BASE,
    {
      ...BASE,
      parameter: 'rest voltage',
      unit: 'V',
      min: 12.5,
      nominal: null,
      max: null,
      material: 'none',
      refTempC: -10,
      notes: 'say "rested", then measure',
    },
    {
      ...BASE,
      component: '=coil',
      testPoints: '+ terminal to ground',
      conditions: '-10 °C start',
      notes: '@ idle, then\r\n3000 rpm',
    },
    {
      ...BASE,
      component: "'=already quoted",
      variant: '',
      yearTo: null,
      sourceUrl: 'https://manuals.specbench.example/k/900',
      min: 1e-7,
      max: 12,
    },
  ];

  it('when rows are exported and imported again, gives back the same rows with no problems', () => {
    const result = validateSpecCsv(toSpecCsv(tricky));
    expect(result.fileErrors).toEqual([]);
    expect(result.rejected).toEqual([]);
    expect(result.accepted.map((a) => a.row)).toEqual(tricky);
  });

  it('when any trimmed text is in the notes or conditions, gives it back unchanged (property)', () => {
    const unit = fc.constantFrom('a', 'Ω', ' ', '=', '+', '-', '@', "'", '"', ',', '\n', '\r', '\t', '0');
    const text = fc.string({ unit, maxLength: 30 }).filter((s) => s === s.trim());
    fc.assert(
      fc.property(text, text, (notes, conditions) => {
        const row = { ...BASE, notes, conditions };
        const result = validateSpecCsv(toSpecCsv([row]));
        expect(result.accepted.map((a) => a.row)).toEqual([row]);
      }),
    );
  });
});

function escapeRe(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
