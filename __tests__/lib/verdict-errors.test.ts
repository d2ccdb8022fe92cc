import { evaluateReading, VerdictInputError, type VerdictInput } from '@/lib/verdict';

const base: VerdictInput = { spec: { min: 3.57, max: 4.83, unit: 'Ω' }, reading: { value: 3.9, unit: 'Ω' } };
const withBase = (patch: Partial<VerdictInput>): VerdictInput => ({ ...base, ...patch });

function fieldOf(input: VerdictInput): string {
  try {
    evaluateReading(input);
  } catch (err) {
    expect(err).toBeInstanceOf(VerdictInputError);
    return (err as VerdictInputError).field;
  }
  throw new Error('expected evaluateReading to throw');
}

describe('evaluateReading input errors', () => {
  it.each([
    ['a reading of the wrong kind', withBase({ reading: { value: 12, unit: 'V' } }), 'reading.unit'],
    ['an unknown reading unit', withBase({ reading: { value: 12, unit: 'furlong' as never } }), 'reading.unit'],
    ['a lead resistance in volts', withBase({ leadResistance: { value: 0.3, unit: 'V' } }), 'leadResistance.unit'],
    [
      'a lead resistance on a voltage spec',
      {
        spec: { min: 12, unit: 'V' },
        reading: { value: 12.5, unit: 'V' },
        leadResistance: { value: 0.3, unit: 'Ω' },
      } as VerdictInput,
      'leadResistance',
    ],
    [
      'a series resistance on a length spec',
      {
        spec: { min: 0.7, max: 0.8, unit: 'mm' },
        reading: { value: 0.75, unit: 'mm' },
        seriesResistance: { value: 5, unit: 'kΩ' },
      } as VerdictInput,
      'seriesResistance',
    ],
    ['a negative lead resistance', withBase({ leadResistance: { value: -0.3, unit: 'Ω' } }), 'leadResistance'],
    [
      'a series tolerance over 100 %',
      withBase({ reading: { value: 13, unit: 'Ω' }, seriesResistance: { value: 9, unit: 'Ω', tolerancePct: 120 } }),
      'seriesResistance.tolerancePct',
    ],
    [
      'leads larger than the reading (negative after subtraction)',
      withBase({ reading: { value: 0.5, unit: 'Ω' }, leadResistance: { value: 1.2, unit: 'Ω' } }),
      'reading',
    ],
    [
      'a series resistor larger than the reading',
      withBase({ reading: { value: 8, unit: 'kΩ' }, seriesResistance: { value: 10, unit: 'kΩ' } }),
      'reading',
    ],
    ['a negative resistance reading', withBase({ reading: { value: -1, unit: 'Ω' } }), 'reading'],
    ['a winding temperature above 200 °C', withBase({ temperatureC: 201 }), 'temperatureC'],
    ['a winding temperature below −40 °C', withBase({ temperatureC: -41 }), 'temperatureC'],
    ['a reference temperature out of range', withBase({ spec: { ...base.spec, refTempC: 250 } }), 'spec.refTempC'],
    ['min greater than max', withBase({ spec: { min: 4.83, max: 3.57, unit: 'Ω' } }), 'spec.min'],
    ['a nominal only', withBase({ spec: { nominal: 4.2, unit: 'Ω' } }), 'spec'],
    ['no limits at all', withBase({ spec: { unit: 'Ω' } }), 'spec'],
    ['an unknown spec unit', withBase({ spec: { min: 1, unit: 'ohmz' as never } }), 'spec.unit'],
    [
      'copper on a voltage spec',
      { spec: { min: 12, unit: 'V', material: 'copper' }, reading: { value: 12.5, unit: 'V' } } as VerdictInput,
      'spec.material',
    ],
    ['a near-limit band over 50 %', withBase({ spec: { ...base.spec, nearLimitPct: 60 } }), 'spec.nearLimitPct'],
    [
      'a meter count in volts on a resistance',
      withBase({ meter: { percent: 1, counts: 2, countValue: 0.01, unit: 'V' } }),
      'meter.unit',
    ],
    ['a missing reading', withBase({ reading: undefined as never }), 'reading'],
  ])('when given %s, throws VerdictInputError on %s', (_what, input, field) => {
    expect(fieldOf(input)).toBe(field);
  });

  it.each([
    ['reading NaN', withBase({ reading: { value: Number.NaN, unit: 'Ω' } }), 'reading.value'],
    ['reading Infinity', withBase({ reading: { value: Number.POSITIVE_INFINITY, unit: 'Ω' } }), 'reading.value'],
    ['spec.min NaN', withBase({ spec: { min: Number.NaN, max: 4.83, unit: 'Ω' } }), 'spec.min'],
    ['spec.max -Infinity', withBase({ spec: { min: 3.57, max: Number.NEGATIVE_INFINITY, unit: 'Ω' } }), 'spec.max'],
    ['spec.nominal NaN', withBase({ spec: { ...base.spec, nominal: Number.NaN } }), 'spec.nominal'],
    ['lead NaN', withBase({ leadResistance: { value: Number.NaN, unit: 'Ω' } }), 'leadResistance.value'],
    ['temperature NaN', withBase({ temperatureC: Number.NaN }), 'temperatureC'],
    [
      'meter percent Infinity',
      withBase({ meter: { percent: Number.POSITIVE_INFINITY, counts: 2, countValue: 0.01, unit: 'Ω' } }),
      'meter.percent',
    ],
  ])('when %s, throws VerdictInputError on %s', (_what, input, field) => {
    expect(fieldOf(input)).toBe(field);
  });

  it('the negative-after-subtraction message says what to do', () => {
    expect(() =>
      evaluateReading(withBase({ reading: { value: 0.5, unit: 'Ω' }, leadResistance: { value: 1.2, unit: 'Ω' } })),
    ).toThrow(/is negative \(-0\.7 Ω\): re-zero the leads/);
  });

  it('accepts the limits of the temperature range (−40 and 200 °C)', () => {
    expect(() => evaluateReading(withBase({ temperatureC: -40 }))).not.toThrow();
    expect(() => evaluateReading(withBase({ temperatureC: 200 }))).not.toThrow();
  });

  it('accepts JSON nulls for optional fields and the OHM SIGN as a unit', () => {
    const input = {
      spec: { min: 3.57, nominal: null, max: 4.83, unit: '\u2126', refTempC: null, material: null, nearLimitPct: null },
      reading: { value: 3.9, unit: 'ohm' },
      leadResistance: null,
      temperatureC: null,
      meter: null,
    };
    expect(evaluateReading(input as unknown as VerdictInput)).toMatchObject({ verdict: 'pass', unit: 'Ω' });
  });
});
