import { SPEC_CSV_COLUMNS, checkCsvBytes, decodeCsv, validateSpecCsv } from '@/lib/csv';

const utf8 = (s: string) => new TextEncoder().encode(s);
const ROW =
  'Kestrel Moto,900 Trail,2016,2021,898 cc,ignition coil,primary winding resistance,2.9,3.2,3.5,Ω,20,copper,,,Kestrel Moto Service Manual,Rev. B,7-12,,';
/** A file written before the mode, near_limit and engine_rpm columns existed: it still imports. */
const OLD_HEADER =
  'make,model,year_from,year_to,variant,component,parameter,min,nominal,max,unit,ref_temp_c,material,test_points,conditions,source_title,source_edition,source_page,source_url,notes';
const CSV = `${OLD_HEADER}\r\n${ROW}\r\n`;

function utf16le(s: string, bom: boolean): Uint8Array {
  const out = new Uint8Array(s.length * 2 + (bom ? 2 : 0));
  let i = 0;
  if (bom) {
    out[i++] = 0xff;
    out[i++] = 0xfe;
  }
  for (const ch of s) {
    const code = ch.charCodeAt(0);
    out[i++] = code & 0xff;
    out[i++] = code >> 8;
  }
  return out;
}

describe('lib/csv checkCsvBytes', () => {
  it.each([
    ['plain UTF-8', utf8(CSV)],
    ['UTF-8 with a BOM', new Uint8Array([0xef, 0xbb, 0xbf, ...utf8(CSV)])],
  ])('when the file is %s, finds no problem', (_name, bytes) => {
    expect(checkCsvBytes(bytes)).toBeNull();
  });

  it.each([
    ['UTF-16 LE with a BOM', utf16le(CSV, true), 1, /UTF-16/],
    ['UTF-16 BE with a BOM', new Uint8Array([0xfe, 0xff, 0x00, 0x6d, 0x00, 0x61]), 1, /UTF-16/],
    ['UTF-16 LE without a BOM', utf16le(CSV, false), 1, /UTF-16/],
    ['an .xlsx workbook', new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x06, 0x00]), 1, /workbook/],
    ['binary data with a NUL byte on line 2', utf8(`${SPEC_CSV_COLUMNS.join(',')}\nab\u0000cd\n`), 2, /binary data/],
    [
      'Windows-1252 (an é as 0xE9) on line 2',
      new Uint8Array([...utf8('make,model\n'), 0x43, 0x61, 0x66, 0xe9, 0x0a]),
      2,
      /not valid UTF-8/,
    ],
  ])('when the file is %s, reports a file-level problem on line %d', (_name, bytes, line, reason) => {
    expect(checkCsvBytes(bytes)).toEqual({ line, column: null, reason: expect.stringMatching(reason) });
  });

  it('tells the editor how to save the file instead', () => {
    expect(checkCsvBytes(utf16le(CSV, true))?.reason).toMatch(/CSV UTF-8/);
  });
});

describe('lib/csv decodeCsv', () => {
  it('when the bytes start with a UTF-8 BOM, drops it so the first column is found', () => {
    const text = decodeCsv(new Uint8Array([0xef, 0xbb, 0xbf, ...utf8(CSV)]));
    expect(text.charCodeAt(0)).toBe('m'.charCodeAt(0));
    const result = validateSpecCsv(text);
    expect(result.fileErrors).toEqual([]);
    expect(result.accepted[0].row.unit).toBe('Ω');
  });

  it('when the bytes are not UTF-8, throws', () => {
    expect(() => decodeCsv(new Uint8Array([0x43, 0xe9, 0x0a]))).toThrow();
  });
});
