import { convert, formatRange } from '@/lib/units';
import { evaluateReading, type VerdictInput } from '@/lib/verdict';

// Trade facts: common practice, no published source. Limits are typical service-manual values, used as examples.
describe('evaluateReading on workshop readings', () => {
  it('primary winding: 7.8 Ω read through leads that read 3.9 Ω is 3.9 Ω, inside 3.57–4.83 Ω → pass', () => {
    // Common practice, no published source.
    const result = evaluateReading({
      spec: { min: 3.57, max: 4.83, unit: 'Ω' },
      reading: { value: 7.8, unit: 'Ω' },
      leadResistance: { value: 3.9, unit: 'Ω' },
    });
    expect(result.value).toBe(3.9); // exact decimal: 7.8 − 3.9 is 3.9, not 3.8999999999999995
    expect(result).toMatchObject({
      verdict: 'pass',
      unit: 'Ω',
      expandedUncertainty: null,
      conformanceProbability: null,
    });
    expect(result.steps.find((s) => s.label.startsWith('Test-lead resistance subtracted'))).toMatchObject({
      formula: 'R = 7.8 Ω − 3.9 Ω = 3.9 Ω',
      unit: 'Ω',
    });
    expect(result.reason).toBe('Inside 3.57–4.83 Ω. No meter accuracy was given, so the uncertainty is unknown.');
  });

  it('secondary winding: 22.8 kΩ through a 10 kΩ resistor cap is 12.8 kΩ, inside 10.7–14.5 kΩ → pass', () => {
    // Common practice, no published source. The cap is given in Ω to exercise the conversion.
    const result = evaluateReading({
      spec: { min: 10.7, nominal: 12.6, max: 14.5, unit: 'kΩ' },
      reading: { value: 22.8, unit: 'kΩ' },
      seriesResistance: { value: 10000, unit: 'Ω' },
    });
    expect(result.value).toBeCloseTo(22.8 - convert(10000, 'Ω', 'kΩ'), 12);
    expect(result.verdict).toBe('pass');
  });

  it('pickup coil: 213.2 Ω with probes at 1.3 Ω is 211.9 Ω, inside 189–231 Ω → pass', () => {
    // Common practice, no published source.
    const result = evaluateReading({
      spec: { min: 189, max: 231, unit: 'Ω' },
      reading: { value: 213.2, unit: 'Ω' },
      leadResistance: { value: 1.3, unit: 'Ω' },
    });
    expect(result.value).toBeCloseTo(213.2 - 1.3, 12);
    expect(result.verdict).toBe('pass');
  });

  it('electrode gap: 0.030 in is 0.762 mm, inside 0.7–0.8 mm → pass', () => {
    // Common practice, no published source; 25.4 mm/in from NIST SP 811 (2008) Appendix B.
    const result = evaluateReading({ spec: { min: 0.7, max: 0.8, unit: 'mm' }, reading: { value: 0.03, unit: 'in' } });
    expect(result.value).toBeCloseTo(0.03 * 25.4, 12);
    expect(result.verdict).toBe('pass');
    expect(result.steps[1]).toMatchObject({ label: 'Converted to the spec unit (mm)', formula: '0.03 in = 0.762 mm' });
  });

  it.each([0.3, 1.6])('probes shorted read about 0.3–1.6 Ω: %d Ω is subtracted from the reading', (lead) => {
    // Common practice, no published source.
    const result = evaluateReading({
      spec: { min: 189, max: 231, unit: 'Ω' },
      reading: { value: 213.2, unit: 'Ω' },
      leadResistance: { value: lead, unit: 'Ω' },
    });
    expect(result.value).toBeCloseTo(213.2 - lead, 12);
  });
});

describe('evaluateReading with a meter (U known)', () => {
  const meter = { percent: 1, counts: 2, countValue: 0.01, unit: 'Ω' as const };
  const spec = { min: 3.57, max: 4.83, unit: 'Ω' as const };

  it('combines the raw and lead readings in quadrature and reports the interval in the reason', () => {
    const result = evaluateReading({
      spec,
      reading: { value: 7.8, unit: 'Ω' },
      leadResistance: { value: 3.9, unit: 'Ω' },
      meter,
    });
    const uRaw = (0.01 * 7.8 + 2 * 0.01) / Math.sqrt(3);
    const uLead = (0.01 * 3.9 + 2 * 0.01) / Math.sqrt(3);
    const U = 2 * Math.sqrt(uRaw ** 2 + uLead ** 2);
    expect(result.expandedUncertainty).toBeCloseTo(U, 12);
    expect(result.zones.interval?.[0]).toBeCloseTo(result.value - U, 12);
    expect(result.verdict).toBe('pass');
    const x = result.value;
    expect(result.reason).toBe(
      `Inside 3.57–4.83 Ω with its uncertainty interval ${formatRange(x - U, null, x + U, 'Ω')}.`,
    );
    expect(result.conformanceProbability).toBeGreaterThan(0.99);
  });

  it('adds the series resistor tolerance as a rectangular term', () => {
    const input: VerdictInput = {
      spec: { min: 10.7, max: 14.5, unit: 'kΩ' },
      reading: { value: 22.8, unit: 'kΩ' },
      seriesResistance: { value: 10, unit: 'kΩ', tolerancePct: 5 },
      meter: { percent: 1, counts: 2, countValue: 0.1, unit: 'kΩ' },
    };
    const uRaw = (0.01 * 22.8 + 2 * 0.1) / Math.sqrt(3);
    const uSeries = (0.05 * 10) / Math.sqrt(3);
    expect(evaluateReading(input).expandedUncertainty).toBeCloseTo(2 * Math.hypot(uRaw, uSeries), 12);
  });

  it('a series resistor without a tolerance adds no uncertainty and the step says so', () => {
    const result = evaluateReading({
      spec: { min: 10.7, max: 14.5, unit: 'kΩ' },
      reading: { value: 22.8, unit: 'kΩ' },
      seriesResistance: { value: 10, unit: 'kΩ' },
      meter: { percent: 1, counts: 2, countValue: 0.1, unit: 'kΩ' },
    });
    expect(result.expandedUncertainty).toBeCloseTo((2 * (0.01 * 22.8 + 0.2)) / Math.sqrt(3), 12);
    expect(result.steps.some((s) => s.label.startsWith('Series resistor tolerance not given'))).toBe(true);
  });

  it.each([
    [4.78, 'marginal', /reaches the maximum 4\.83 Ω: conformity is not proven/],
    [4.9, 'marginal', /^Above the maximum 4\.83 Ω, but .* reaches back to it/],
    [5.5, 'fail', /^Above the maximum 4\.83 Ω even allowing for its uncertainty interval/],
    [3.4, 'fail', /^Below the minimum 3\.57 Ω even allowing/],
  ])('a reading of %d Ω (U ≈ 0.08 Ω) is %s', (value, verdict, reason) => {
    const result = evaluateReading({ spec, reading: { value, unit: 'Ω' }, meter });
    expect(result.verdict).toBe(verdict);
    expect(result.reason).toMatch(reason);
  });
});

describe('evaluateReading temperature and one-sided specs', () => {
  it('for a non-copper part, records the temperature without correcting', () => {
    const result = evaluateReading({
      spec: { min: 4, max: 6, unit: 'kΩ', material: 'none' },
      reading: { value: 5, unit: 'kΩ' },
      temperatureC: 60,
    });
    expect(result.value).toBe(5);
    expect(result.steps.at(-2)).toMatchObject({
      label: expect.stringContaining('no correction because the part is not a copper winding'),
      value: 60,
      unit: '°C',
    });
  });

  it('for a copper part without a temperature, says the reading is taken as at the reference', () => {
    const result = evaluateReading({
      spec: { min: 4, max: 6, unit: 'Ω', material: 'copper', refTempC: 25 },
      reading: { value: 5, unit: 'Ω' },
    });
    expect(result.steps.some((s) => s.label.includes('taken as at 25 °C'))).toBe(true);
  });

  it('a minimum-only voltage spec fails a reading below it and says by how much', () => {
    const result = evaluateReading({ spec: { min: 12.6, unit: 'V' }, reading: { value: 12100, unit: 'mV' } });
    expect(result.verdict).toBe('fail');
    expect(result.reason).toMatch(/^Below the minimum 12\.6 V by 0\.5 V\./);
    // Source: ILAC-G8:09/2019 §4.2.1 — a one-sided spec with no stated band is simple acceptance (w = 0).
    expect(result.zones).toMatchObject({ lower: 12.6, nearBand: undefined });
  });

  it('a maximum-only current spec near its limit passes unless the spec states a band, then it names it', () => {
    const plain = evaluateReading({ spec: { max: 15, unit: 'A' }, reading: { value: 14500, unit: 'mA' } });
    expect(plain.verdict).toBe('pass');
    const banded = evaluateReading({
      spec: { max: 15, unit: 'A', nearLimitPct: 5 },
      reading: { value: 14500, unit: 'mA' },
    });
    expect(banded.verdict).toBe('marginal');
    expect(banded.reason).toMatch(
      /within 0\.75 A of the maximum 15 A \(near-limit band 5 % of the limit, as the spec states\)/,
    );
  });
});
