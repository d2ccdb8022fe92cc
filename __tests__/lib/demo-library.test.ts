import { readFileSync } from 'fs';
import { join } from 'path';
import { checkCsvBytes, decodeCsv, validateSpecCsv } from '@/lib/csv';

const read = (name: string) => readFileSync(join(__dirname, '../../data', name));
const demoBytes = read('demo-library.csv');
const demoText = decodeCsv(demoBytes);
const demo = validateSpecCsv(demoText);
const rows = demo.accepted.map((a) => a.row);

describe('data/demo-library.csv', () => {
  it('is UTF-8 text that validates with no file errors and no rejected rows', () => {
    expect(checkCsvBytes(demoBytes)).toBeNull();
    expect(demo.fileErrors).toEqual([]);
    expect(demo.rejected).toEqual([]);
  });

  it('raises no plausibility warnings', () => {
    expect(demo.accepted.flatMap((a) => a.warnings)).toEqual([]);
  });

  it('has at least 4 makes, 10 models and 120 specs', () => {
    expect(new Set(rows.map((r) => r.make)).size).toBeGreaterThanOrEqual(4);
    expect(new Set(rows.map((r) => `${r.make}|${r.model}`)).size).toBeGreaterThanOrEqual(10);
    expect(rows.length).toBeGreaterThanOrEqual(120);
  });

  it('gives every model (years and variant) between 10 and 15 specs', () => {
    const counts = new Map<string, number>();
    for (const r of rows) {
      const key = `${r.make}|${r.model}|${r.yearFrom}|${r.variant}`;
      counts.set(key, (counts.get(key) ?? 0) + 1);
    }
    for (const [model, count] of counts) expect([model, count >= 10 && count <= 15]).toEqual([model, true]);
  });

  it('has a Kestrel Moto 900 Trail primary winding spec for the search example', () => {
    expect(rows).toContainEqual(
      expect.objectContaining({ make: 'Kestrel Moto', model: '900 Trail', parameter: 'Primary winding resistance' }),
    );
  });

  it('exercises CSV quoting with cells that contain commas and double quotes', () => {
    expect(rows.some((r) => r.testPoints.includes(',') && r.testPoints.includes('"'))).toBe(true);
    expect(demoText).toMatch(/""/);
  });

  it.each([
    'electrode gap',
    'rest voltage',
    'charging voltage',
    'fuse rating',
    'pickup coil resistance',
    'stator winding resistance',
    'plug cap resistance',
    'secondary winding resistance with plug cap',
  ])('covers the parameter %s', (parameter) => {
    expect(rows.some((r) => r.parameter.toLowerCase() === parameter)).toBe(true);
  });

  // The demo data is invented: it must not repeat the check values that the engine's tests take from published sources.
  it.each<[number, number, string]>([
    [3.57, 4.83, 'Ω'],
    [10.7, 14.5, 'kΩ'],
    [189, 231, 'Ω'],
    [0.7, 0.8, 'mm'],
  ])('does not use the published check limits %d–%d %s', (min, max, unit) => {
    expect(rows.filter((r) => r.unit === unit && r.min === min && r.max === max)).toEqual([]);
  });

  it('uses only the invented makes of the demo scenario (a new make must be added here on purpose)', () => {
    expect([...new Set(rows.map((r) => r.make))].sort()).toEqual([
      'Corvane',
      'Kestrel Moto',
      'Marrowdown Engines',
      'Quillback Powersports',
    ]);
  });
});

describe('data/spec-template.csv', () => {
  it('is a header plus two example rows that validate', () => {
    const result = validateSpecCsv(decodeCsv(read('spec-template.csv')));
    expect(result.fileErrors).toEqual([]);
    expect(result.rejected).toEqual([]);
    expect(result.accepted.map((a) => a.line)).toEqual([2, 3]);
  });
});
