import {
  evaluateReading,
  meterHalfWidth,
  rectangularStd,
  referToTemperature,
  VerdictInputError,
  type VerdictInput,
} from '@/lib/verdict';

describe('meterHalfWidth, rectangularStd and U', () => {
  // Source: Kwantlen Polytechnic University physics tutorial "Digital Multimeter Uncertainties":
  // ±(2.5 % + 3 dgt) on 32.00 V, last digit 0.01 V → a = 0.80 + 0.03 = 0.83 V [quoted].
  // Source: JCGM 100:2008 (GUM) §4.3.7, u = a/√3 (from memory, high confidence) → 0.479201 V [computed].
  // Source: NIST Technical Note 1297 (1994) §6.2, U = k·u with k = 2 → 0.958401 V [computed].
  const meter = { percent: 2.5, counts: 3, countValue: 0.01, unit: 'V' as const };
  const a = (2.5 / 100) * 32.0 + 3 * 0.01;

  it('on 32.00 V, a = 0.83 V', () => {
    expect(meterHalfWidth({ value: 32.0, unit: 'V' }, meter)).toBeCloseTo(a, 12);
    expect(meterHalfWidth({ value: 32.0, unit: 'V' }, meter)).toBeCloseTo(0.83, 12);
  });

  it('u = a/√3 = 0.479201 V and U = 2u = 0.958401 V', () => {
    const u = rectangularStd(a);
    expect(u).toBeCloseTo(a / Math.sqrt(3), 14);
    expect(Math.abs(u - 0.479201)).toBeLessThan(5e-7);
    expect(Math.abs(2 * u - 0.958401)).toBeLessThan(5e-7);
  });

  it('through evaluateReading, a 32.00 V reading reports U = 0.958401 V', () => {
    const result = evaluateReading({
      spec: { min: 28, max: 36, unit: 'V' },
      reading: { value: 32.0, unit: 'V' },
      meter,
    });
    expect(Math.abs((result.expandedUncertainty as number) - 0.958401)).toBeLessThan(5e-7);
    expect(result.verdict).toBe('pass');
  });

  it('converts the count value into the reading unit (2 counts of 1 mV on 12.6 V at 0.5 %)', () => {
    const half = meterHalfWidth({ value: 12.6, unit: 'V' }, { percent: 0.5, counts: 2, countValue: 1, unit: 'mV' });
    expect(half).toBeCloseTo(0.005 * 12.6 + 2 * 0.001, 12);
  });

  it('uses |x| for a negative reading', () => {
    expect(meterHalfWidth({ value: -32, unit: 'V' }, meter)).toBeCloseTo(a, 12);
  });

  it.each([
    [{ ...meter, unit: 'Ω' as const }, 'meter.unit'],
    [{ ...meter, percent: -1 }, 'meter.percent'],
    [{ ...meter, counts: Number.NaN }, 'meter.counts'],
    [{ ...meter, countValue: Number.POSITIVE_INFINITY }, 'meter.countValue'],
  ])('when the meter is invalid (%j), throws VerdictInputError on %s', (bad, field) => {
    expect(() => meterHalfWidth({ value: 32, unit: 'V' }, bad)).toThrow(expect.objectContaining({ field }));
    expect(() => meterHalfWidth({ value: 32, unit: 'V' }, bad)).toThrow(VerdictInputError);
  });
});

describe('referToTemperature (copper)', () => {
  // Source: NBS Handbook 100 (1966), Part I §1.1 — inferred zero −234.5 °C, R₂ = R₁·(234.5 + T₂)/(234.5 + T₁);
  // the results are [computed] in REFERENCES §2.
  it.each([
    [0.5, 20, 80, 0.617878, 5e-7],
    [3000, 20, 100, 3943.03, 0.005],
  ])('%d Ω at %d °C is %d Ω at %d °C', (r, tFrom, tTo, quoted, tolerance) => {
    const recomputed = (r * (234.5 + tTo)) / (234.5 + tFrom);
    expect(referToTemperature(r, tFrom, tTo)).toBeCloseTo(recomputed, 10);
    expect(Math.abs(referToTemperature(r, tFrom, tTo) - quoted)).toBeLessThan(tolerance);
  });

  // Source: NBS Handbook 100 (1966), Part I §1.1 — α₂₀ = 0.00393 /°C; the linear form gives 0.61790 Ω,
  // agreeing with the inferred-zero form to ~1e-4 relative (REFERENCES §2).
  it('agrees with the linear α₂₀ form to 1e-4 relative', () => {
    const linear = 0.5 * (1 + 0.00393 * (80 - 20));
    expect(Math.abs(referToTemperature(0.5, 20, 80) - linear) / linear).toBeLessThan(1e-4);
  });

  it('refers back: 0.617878 Ω read at 80 °C is 0.5 Ω at 20 °C through evaluateReading', () => {
    const hot = referToTemperature(0.5, 20, 80);
    const input: VerdictInput = {
      spec: { min: 0.45, max: 0.55, unit: 'Ω', material: 'copper', refTempC: 20 },
      reading: { value: hot, unit: 'Ω' },
      temperatureC: 80,
    };
    const result = evaluateReading(input);
    expect(result.value).toBeCloseTo(0.5, 12);
    expect(result.verdict).toBe('pass');
    expect(result.steps.find((s) => s.label.startsWith('Referred from 80 °C to 20 °C'))?.value).toBeCloseTo(0.5, 12);
  });

  it('refers 3943.03 Ω at 100 °C back to 3000 Ω at the default 20 °C', () => {
    const result = evaluateReading({
      spec: { min: 2700, max: 3300, unit: 'Ω', material: 'copper' },
      reading: { value: 3943.03, unit: 'Ω' },
      temperatureC: 100,
    });
    expect(Math.abs(result.value - 3000)).toBeLessThan(0.01);
  });

  it('scales the uncertainty by the same temperature factor', () => {
    const base: VerdictInput = {
      spec: { min: 0.4, max: 0.7, unit: 'Ω', material: 'copper' },
      reading: { value: 0.6, unit: 'Ω' },
      meter: { percent: 1, counts: 2, countValue: 0.01, unit: 'Ω' },
    };
    const cold = evaluateReading(base).expandedUncertainty as number;
    const hot = evaluateReading({ ...base, temperatureC: 80 }).expandedUncertainty as number;
    expect(hot).toBeCloseTo(cold * ((234.5 + 20) / (234.5 + 80)), 12);
  });

  it('throws RangeError at or below the inferred zero', () => {
    expect(() => referToTemperature(1, -234.5, 20)).toThrow(RangeError);
  });
});
