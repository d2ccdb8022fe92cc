/**
 * A measured step in the run's calculator: the limits come from the library spec on the
 * machine, else the plan's, else the technician; the calculator's input goes to the server
 * as the step's reading. Values are invented for the test (no published source needed: the
 * checks are about which limits are used and what is sent, not about the trade).
 */
import type { RunStepDto, SpecForStepDto } from '@/lib/contracts/plans';
import { planLimits, stepLimits, toStepReading, typedSpec } from '@/lib/plans/step-reading';
import { evaluateReading, type VerdictInput } from '@/lib/verdict';

const SPEC: SpecForStepDto = {
  id: 9,
  mode: 'resistance',
  engineRpm: null,
  quantityKind: 'resistance',
  min: 2.4,
  nominal: null,
  max: 3.2,
  unit: 'Ω',
  display: '2.4–3.2 Ω',
  testPoints: null,
  conditions: null,
  refTempC: 20,
  material: 'copper',
  nearLimit: 0.05,
};
const step = (check: RunStepDto['check'], spec: SpecForStepDto | null = null) =>
  ({ id: 's1', title: 'Coil primary', check, spec, position: 0, connector: null }) as unknown as RunStepDto;

describe('stepLimits', () => {
  it('the library spec wins, with everything the server judges with (temperature, band, mode)', () => {
    const got = stepLimits(
      step({ kind: 'spec', component: 'coil', parameter: 'primary', limits: { max: 9, unit: 'Ω' } }, SPEC),
    );
    expect(got).toEqual({
      from: 'library',
      kind: 'resistance',
      spec: {
        min: 2.4,
        nominal: null,
        max: 3.2,
        unit: 'Ω',
        refTempC: 20,
        material: 'copper',
        nearLimit: 0.05,
        mode: 'resistance',
        engineRpm: null,
      },
    });
  });

  it("without a library spec, the plan's own limits", () => {
    const s = step({ kind: 'spec', component: 'coil', parameter: 'primary', limits: { min: 12.5, unit: 'V' } });
    expect(stepLimits(s)).toEqual({
      from: 'plan',
      kind: 'voltage',
      spec: { min: 12.5, nominal: null, max: null, unit: 'V' },
    });
    expect(planLimits(step({ kind: 'limits', limits: { max: 1, unit: 'Ω' } }))).toEqual({ max: 1, unit: 'Ω' });
  });

  it('neither: null, so the technician types the limits', () => {
    expect(stepLimits(step({ kind: 'spec', component: 'coil', parameter: 'primary' }))).toBeNull();
  });
});

describe('toStepReading', () => {
  const input: VerdictInput = {
    spec: typedSpec({ min: 2.4, max: 3.2, unit: 'Ω' }),
    reading: { value: 3.1, unit: 'Ω' },
    leadResistance: { value: 0.3, unit: 'Ω' },
    seriesResistance: { value: 5, unit: 'kΩ', tolerancePct: 20 },
    temperatureC: 30,
    meter: { percent: 0.5, counts: 2, countValue: 0.1, unit: 'Ω' },
  };

  it('sends the reading and every correction, and the limits only when typed by hand', () => {
    expect(toStepReading(input)).toEqual({
      value: 3.1,
      unit: 'Ω',
      leadResistance: { value: 0.3, unit: 'Ω' },
      seriesResistance: { value: 5, unit: 'kΩ', tolerancePct: 20 },
      temperatureC: 30,
      meter: { percent: 0.5, counts: 2, countValue: 0.1, unit: 'Ω' },
    });
    expect(toStepReading(input, { min: 2.4, max: 3.2, unit: 'Ω' }).limits).toEqual({ min: 2.4, max: 3.2, unit: 'Ω' });
  });

  it('a reading without corrections sends none', () => {
    expect(toStepReading({ spec: input.spec, reading: { value: 2.9, unit: 'Ω' } })).toEqual({ value: 2.9, unit: 'Ω' });
  });

  it('what the calculator shows is what the same engine gives for the limits the step uses', () => {
    // 3.1 Ω read through 0.3 Ω leads is 2.8 Ω: inside 2.4–3.2 Ω, well clear of both limits.
    const limits = stepLimits(step({ kind: 'spec', component: 'coil', parameter: 'primary' }, SPEC))!;
    expect(
      evaluateReading({
        spec: limits.spec,
        reading: { value: 3.1, unit: 'Ω' },
        leadResistance: { value: 0.3, unit: 'Ω' },
      }).verdict,
    ).toBe('pass');
  });
});
