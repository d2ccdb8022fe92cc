import fc from 'fast-check';
import {
  CANONICAL_UNITS,
  convert,
  formatNumber,
  formatQuantity,
  formatRange,
  parseUnit,
  UnitMismatchError,
  unitKind,
  unitsOfKind,
  type CanonicalUnit,
} from '@/lib/units';

// Source: NIST SP 811 (2008), Appendix B: 1 in = 0.0254 m exactly = 25.4 mm (exact by the 1959 definition).
const MM_PER_INCH = 25.4;
// Source: NIST SP 811 (2008), Appendix B: 1 mil (thousandth of an inch) = 25.4 µm — row text from memory.
const MM_PER_THOU = MM_PER_INCH / 1000;

describe('parseUnit', () => {
  it.each([
    ['Ω', 'Ω', 'resistance'],
    ['\u2126', 'Ω', 'resistance'], // OHM SIGN
    ['  Ω  ', 'Ω', 'resistance'],
    ['ohm', 'Ω', 'resistance'],
    ['ohms', 'Ω', 'resistance'],
    ['Ohm', 'Ω', 'resistance'],
    ['kΩ', 'kΩ', 'resistance'],
    ['k\u2126', 'kΩ', 'resistance'],
    ['kohm', 'kΩ', 'resistance'],
    ['MΩ', 'MΩ', 'resistance'],
    ['Mohm', 'MΩ', 'resistance'],
    ['V', 'V', 'voltage'],
    ['mV', 'mV', 'voltage'],
    ['A', 'A', 'current'],
    ['mA', 'mA', 'current'],
    ['mm', 'mm', 'length'],
    ['in', 'in', 'length'],
    ['inch', 'in', 'length'],
    ['thou', 'thou', 'length'],
    ['mil', 'thou', 'length'],
  ])('when given %j, returns %s (%s)', (text, unit, kind) => {
    expect(parseUnit(text)).toEqual({ unit, kind });
  });

  it.each(['', 'mohm', 'mΩ', 'MV', 'v', 'Mm', 'ft', 'ohmz', '12 V'])(
    'when given %j (unknown or wrong prefix case), returns null',
    (text) => {
      expect(parseUnit(text)).toBeNull();
    },
  );
});

describe('unitKind and unitsOfKind', () => {
  it.each([
    ['resistance', ['Ω', 'kΩ', 'MΩ']],
    ['voltage', ['V', 'mV']],
    ['current', ['A', 'mA']],
    ['length', ['mm', 'in', 'thou']],
  ] as const)('when asked for %s, lists %j and each maps back to the kind', (kind, units) => {
    expect(unitsOfKind(kind)).toEqual(units);
    for (const unit of units) expect(unitKind(unit)).toBe(kind);
  });

  it('when given a string that is not a canonical unit, unitKind throws', () => {
    expect(() => unitKind('ohm' as CanonicalUnit)).toThrow(TypeError);
  });

  it('CANONICAL_UNITS holds the ten units of the contract', () => {
    expect([...CANONICAL_UNITS].sort()).toEqual(['A', 'MΩ', 'V', 'in', 'kΩ', 'mA', 'mV', 'mm', 'thou', 'Ω'].sort());
  });
});

describe('convert', () => {
  // Source: NIST SP 811 (2008), Appendix B — the mm values are [computed] from the exact 25.4 mm/in.
  it.each([
    [0.035, 'in', 'mm', 0.035 * MM_PER_INCH, 0.889],
    [0.044, 'in', 'mm', 0.044 * MM_PER_INCH, 1.1176],
    [1, 'thou', 'mm', MM_PER_THOU, 0.0254],
    [30, 'thou', 'in', 0.03, 0.03],
    [0.762, 'mm', 'in', 0.762 / MM_PER_INCH, 0.03],
  ] as const)('when converting %d %s to %s, gives %d (= %d)', (value, from, to, recomputed, quoted) => {
    const result = convert(value, from, to);
    expect(result).toBeCloseTo(recomputed, 12);
    expect(result).toBeCloseTo(quoted, 12);
  });

  // Source: SI prefixes k = 1e3, M = 1e6, m = 1e-3 (SI Brochure, from memory).
  it.each([
    [4.7, 'kΩ', 'Ω', 4700],
    [4700, 'Ω', 'kΩ', 4.7],
    [1.5, 'MΩ', 'kΩ', 1500],
    [250, 'mV', 'V', 0.25],
    [12.6, 'V', 'mV', 12600],
    [15, 'A', 'mA', 15000],
    [350, 'mA', 'A', 0.35],
  ] as const)('when converting %d %s to %s, gives %d', (value, from, to, expected) => {
    expect(convert(value, from, to)).toBeCloseTo(expected, 10);
  });

  it('when the kinds differ, throws UnitMismatchError carrying from and to', () => {
    const attempt = () => convert(1, 'V', 'Ω');
    expect(attempt).toThrow(UnitMismatchError);
    try {
      attempt();
    } catch (err) {
      expect(err).toMatchObject({ from: 'V', to: 'Ω' });
    }
  });

  it('round-trips any value between any two units of one kind within 1e-12 relative', () => {
    // Readings from 1e-12 to 1e9 in size (subnormal doubles are not readings), either sign, or zero.
    const magnitude = fc.double({ min: 1e-12, max: 1e9, noNaN: true });
    const reading = fc.oneof(
      fc.constant(0),
      magnitude,
      magnitude.map((v) => -v),
    );
    const pair = fc
      .constantFrom('resistance', 'voltage', 'current', 'length' as const)
      .chain((kind) => fc.tuple(fc.constantFrom(...unitsOfKind(kind)), fc.constantFrom(...unitsOfKind(kind))));
    fc.assert(
      fc.property(pair, reading, ([from, to], value) => {
        const back = convert(convert(value, from, to), to, from);
        expect(Math.abs(back - value)).toBeLessThanOrEqual(1e-12 * Math.abs(value));
      }),
    );
  });
});

describe('formatNumber', () => {
  it.each([
    [3.9, undefined, '3.9'],
    [0.762, undefined, '0.762'],
    [0, undefined, '0'],
    [-0, undefined, '0'],
    [-3.94, undefined, '-3.94'],
    [12800, undefined, '12800'],
    [0.6178781925, undefined, '0.6179'],
    [3943.0255, undefined, '3943'],
    [123456, undefined, '123500'],
    [3.14159, 3, '3.14'],
    [2.0, 3, '2'],
    [0.0000000015, 2, '1.5e-9'],
  ])('when given %d with %s significant figures, returns %s', (value, significant, expected) => {
    expect(formatNumber(value, significant)).toBe(expected);
  });
});

describe('formatQuantity and formatRange', () => {
  it.each([
    [3.9, 'Ω', '3.9 Ω'],
    [0.889, 'mm', '0.889 mm'],
    [12.8, 'kΩ', '12.8 kΩ'],
  ] as const)('formatQuantity(%d, %s) is %s', (value, unit, expected) => {
    expect(formatQuantity(value, unit)).toBe(expected);
  });

  it.each([
    [2.9, null, 3.7, 'Ω', '2.9–3.7 Ω'],
    [12.6, null, null, 'V', '≥ 12.6 V'],
    [null, null, 15, 'A', '≤ 15 A'],
    [null, 0.8, null, 'mm', '0.8 mm'],
    [10.7, 12.6, 14.5, 'kΩ', '10.7–14.5 kΩ (nominal 12.6)'],
    [null, null, null, 'V', '—'],
  ] as const)('formatRange(%s, %s, %s, %s) is %s', (min, nominal, max, unit, expected) => {
    expect(formatRange(min, nominal, max, unit)).toBe(expected);
  });
});
