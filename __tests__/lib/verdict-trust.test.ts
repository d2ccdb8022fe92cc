/**
 * Issue 10: verdicts a technician can trust. One block per defect seen in use, each failing on the
 * engine as it was before the fix; then the measurement modes and the plain words.
 */
import { calculate, countHint, emptyForm } from '@/lib/calculator/form';
import { memorise, recall, EMPTY_MEMORY } from '@/lib/calculator/memory';
import { ReadingBody } from '@/lib/contracts/jobs';
import { toReadingBody } from '@/lib/offline/reading-body';
import { conformanceProbability, evaluateReading, VerdictInputError, type VerdictInput } from '@/lib/verdict';

const inputError = (input: VerdictInput) => {
  try {
    evaluateReading(input);
  } catch (err) {
    if (err instanceof VerdictInputError) return { field: err.field, message: err.message };
    throw err;
  }
  return null;
};

// Limits are the invented demo library's; the trade figures are common practice, no published source.
describe('defect 1: test leads are typed and remembered in Ω whatever the spec unit', () => {
  const secondary = { min: 15.5, nominal: 17.5, max: 19.5, unit: 'kΩ' as const, material: 'copper' as const };

  it('on a kΩ spec the lead field is in Ω and the series resistor in kΩ', () => {
    const form = emptyForm('kΩ');
    expect(form.leadUnit).toBe('Ω');
    expect(form.seriesUnit).toBe('kΩ');
  });

  it('16.3 kΩ with leads typed "0.4" takes off 0.4 Ω, not 400 Ω, and passes', () => {
    const { result } = calculate(secondary, 'resistance', { ...emptyForm('kΩ'), reading: '16.3', lead: '0.4' });
    expect(result?.valueText).toBe('16.2996');
    expect(result?.verdict).toBe('pass');
    const lead = result?.steps.find((s) => s.label.startsWith('Test-lead'));
    expect(lead?.formula).toBe('R = 16.3 kΩ − 0.4 Ω = 16.2996 kΩ');
  });

  it('a remembered lead value comes back in Ω, and only on resistance checks', () => {
    const typed = { ...emptyForm('kΩ'), reading: '16.3', lead: '0.4', meterPercent: '1' };
    const memory = memorise(EMPTY_MEMORY, 'resistance', typed);
    expect(recall(memory, 'resistance', 'kΩ')).toMatchObject({ lead: '0.4', leadUnit: 'Ω', meterPercent: '1' });
    // A voltage check gets neither the leads nor the ohms meter's accuracy.
    expect(recall(memory, 'voltage', 'V')).toEqual({});
  });
});

describe('defect 2: a one-sided spec has no near-limit band unless it states one', () => {
  // Source: ILAC-G8:09/2019 §4.2.1 — simple acceptance, guard band w = 0.
  const rest = { min: 12.5, unit: 'V' as const };

  it('12.8 V against a minimum of 12.5 V is a pass', () => {
    const result = evaluateReading({ spec: rest, reading: { value: 12.8, unit: 'V' } });
    expect(result.verdict).toBe('pass');
    expect(result.zones.nearBand).toBeUndefined();
    expect(result.explanation).toBe('12.8 V — above the minimum 12.5 V.');
  });

  it('a band applies where the spec states one, as % of the limit or in its unit', () => {
    const pct = evaluateReading({ spec: { ...rest, nearLimitPct: 5 }, reading: { value: 12.8, unit: 'V' } });
    expect(pct.verdict).toBe('marginal');
    const abs = evaluateReading({ spec: { ...rest, nearLimit: 0.2 }, reading: { value: 12.7, unit: 'V' } });
    expect(abs.verdict).toBe('marginal'); // 12.7 − 12.5 is 0.2 exactly: on the band's edge
    expect(evaluateReading({ spec: { ...rest, nearLimit: 0.2 }, reading: { value: 12.71, unit: 'V' } }).verdict).toBe(
      'pass',
    );
  });

  it('two-sided specs keep 5 % of the width', () => {
    const result = evaluateReading({ spec: { min: 2.1, max: 2.9, unit: 'Ω' }, reading: { value: 2.86, unit: 'Ω' } });
    expect(result.verdict).toBe('marginal');
    expect(result.zones.nearBand).toBe(0.04);
  });
});

describe('defect 3: readings on a limit are judged by their decimals, not by binary rounding', () => {
  it('88.57 Ω through 0.17 Ω leads is 88.40 Ω, on the minimum 88.4 Ω: marginal, not fail', () => {
    const result = evaluateReading({
      spec: { min: 88.4, max: 95, unit: 'Ω' },
      reading: { value: 88.57, unit: 'Ω' },
      leadResistance: { value: 0.17, unit: 'Ω' },
    });
    expect(result.value).toBe(88.4);
    expect(result.valueText).toBe('88.40');
    expect(result.verdict).toBe('marginal');
  });

  it('1.01346 mm against a maximum of 39.9 thou is on the limit: marginal, not fail', () => {
    // Source: NIST SP 811 (2008) App. B — 1 thou = 0.0254 mm exactly, so 1.01346 mm = 39.9 thou.
    const result = evaluateReading({ spec: { max: 39.9, unit: 'thou' }, reading: { value: 1.01346, unit: 'mm' } });
    expect(result.value).toBe(39.9);
    expect(result.verdict).toBe('marginal');
  });

  it('3.9 Ω against 2–4 Ω sits exactly on the 0.1 Ω band edge: marginal, not pass', () => {
    const result = evaluateReading({ spec: { min: 2, max: 4, unit: 'Ω' }, reading: { value: 3.9, unit: 'Ω' } });
    expect(result.verdict).toBe('marginal');
  });
});

describe('defect 4: negative voltages and currents are judged as they read', () => {
  it('−12 V against −15…−10 V passes (nothing is subtracted)', () => {
    const result = evaluateReading({ spec: { min: -15, max: -10, unit: 'V' }, reading: { value: -12, unit: 'V' } });
    expect(result.verdict).toBe('pass');
    expect(result.value).toBe(-12);
  });

  it('a negative reading against a positive spec fails and says the probes are probably reversed', () => {
    const result = evaluateReading({ spec: { min: 12.5, unit: 'V' }, reading: { value: -12.6, unit: 'V' } });
    expect(result.verdict).toBe('fail');
    expect(result.explanation).toMatch(/probes are probably reversed/);
    expect(result.reason).toMatch(/probes are probably reversed/);
  });

  it('a resistance reading still cannot be negative', () => {
    expect(inputError({ spec: { max: 4, unit: 'Ω' }, reading: { value: -1, unit: 'Ω' } })?.field).toBe('reading');
  });
});

describe('defect 5: impossible meter figures are refused naming the field', () => {
  const base = { spec: { min: 2, max: 4, unit: 'Ω' as const }, reading: { value: 3, unit: 'Ω' as const } };

  it('meter.percent 1e308 is refused on meter.percent', () => {
    const error = inputError({ ...base, meter: { percent: 1e308, counts: 2, countValue: 0.01, unit: 'Ω' } });
    expect(error?.field).toBe('meter.percent');
  });

  it('a countValue of 0 with counts is refused on meter.countValue', () => {
    const error = inputError({ ...base, meter: { percent: 1, counts: 2, countValue: 0, unit: 'Ω' } });
    expect(error?.field).toBe('meter.countValue');
  });

  it('a countValue of 0 with no counts is a meter stated as % of reading only', () => {
    const result = evaluateReading({ ...base, meter: { percent: 1, counts: 0, countValue: 0, unit: 'Ω' } });
    expect(result.expandedUncertainty).toBeCloseTo((2 * 0.03) / Math.sqrt(3), 12);
  });
});

describe('defect 6: p_c far below the lower limit is the lower tail, not 0', () => {
  it('y = 10, u = 0.5, T_L = 24.5: p_c = Q(29) = 3.28979e-185', () => {
    // Computed: Q(29) = ½·erfc(29/√2) with mpmath at 50 digits = 3.2897852667043802e-185.
    const p = conformanceProbability(10, 0.5, 24.5, 30);
    expect(p / 3.2897852667043802e-185).toBeCloseTo(1, 9);
    // The upper side, mirrored, was already right.
    expect(conformanceProbability(44.5, 0.5, 25, 30) / 3.2897852667043802e-185).toBeCloseTo(1, 9);
  });

  it('keeps the published check', () => {
    // Source: JCGM 106:2012 §7.4 worked example — y = 13.6, u = 1.8, T_L = 12.5, T_U = 16.3 → p_c = 0.66263.
    expect(conformanceProbability(13.6, 1.8, 12.5, 16.3)).toBeCloseTo(0.66263, 4);
  });
});

describe('measurement modes (item 7)', () => {
  const stator = { min: 50, unit: 'V' as const, mode: 'ac_voltage' as const, engineRpm: 5000 };

  it('the first step names the meter mode and the engine speed', () => {
    const result = evaluateReading({ spec: stator, reading: { value: 62, unit: 'V', mode: 'ac_voltage' } });
    expect(result.steps[0].label).toBe('Meter reading on AC volts (rms), engine at 5 000 rpm');
    expect(result.verdict).toBe('pass');
  });

  it('a reading taken in another mode is refused on reading.mode', () => {
    const error = inputError({ spec: stator, reading: { value: 62, unit: 'V', mode: 'dc_voltage' } });
    expect(error?.field).toBe('reading.mode');
    expect(error?.message).toMatch(/DC volts.*AC volts/);
  });

  it('a spec without a mode is read in its quantity’s plain mode', () => {
    expect(inputError({ spec: { min: 12, unit: 'V' }, reading: { value: 13, unit: 'V', mode: 'dc_voltage' } })).toBe(
      null,
    );
    expect(
      inputError({ spec: { min: 12, unit: 'V' }, reading: { value: 13, unit: 'V', mode: 'peak_voltage' } })?.field,
    ).toBe('reading.mode');
  });

  it('a mode that does not read the spec’s quantity is refused on spec.mode', () => {
    expect(
      inputError({ spec: { max: 1, unit: 'Ω', mode: 'ac_voltage' }, reading: { value: 0.2, unit: 'Ω' } })?.field,
    ).toBe('spec.mode');
  });

  it('a diode is judged on its forward voltage on the diode range', () => {
    // Silicon forward voltage about 0.4–0.8 V: common practice, no published source.
    const spec = { min: 0.4, max: 0.8, unit: 'V' as const, mode: 'diode_forward' as const };
    expect(evaluateReading({ spec, reading: { value: 0.55, unit: 'V', mode: 'diode_forward' } }).verdict).toBe('pass');
    expect(evaluateReading({ spec, reading: { value: 0.05, unit: 'V', mode: 'diode_forward' } }).verdict).toBe('fail');
  });
});

describe('words first (item 9) and hints in the spec’s unit (item 10)', () => {
  it('leads with workshop language: the corrected value, the leads taken off, and what it means', () => {
    const result = evaluateReading({
      spec: { min: 2.1, max: 2.9, unit: 'Ω' },
      reading: { value: 3.27, unit: 'Ω' },
      leadResistance: { value: 0.4, unit: 'Ω' },
    });
    expect(result.explanation).toBe(
      "2.87 Ω after taking off 0.4 Ω for the leads — inside 2.1–2.9 Ω, but so close to the top that the meter's accuracy could put it over.",
    );
    expect(result.steps.find((s) => s.label.startsWith('Test-lead'))?.formula).toBe('R = 3.27 Ω − 0.4 Ω = 2.87 Ω');
  });

  it('the working shows each step with its result', () => {
    const result = evaluateReading({
      spec: { min: 2.1, max: 2.9, unit: 'Ω' },
      reading: { value: 3.2, unit: 'Ω' },
      leadResistance: { value: 0.4, unit: 'Ω' },
      meter: { percent: 1, counts: 2, countValue: 0.01, unit: 'Ω' },
    });
    expect(result.steps.find((s) => s.label.startsWith('Test-lead'))?.formula).toBe('R = 3.2 Ω − 0.4 Ω = 2.8 Ω');
    for (const step of result.steps.filter((s) => s.formula)) expect(step.formula).toMatch(/= [^=]+$/);
  });

  it('the count hint is in the spec’s unit', () => {
    expect(countHint('V')).toMatch(/e\.g\. 0\.01 V$/);
    expect(countHint('mm')).toMatch(/mm$/);
    expect(countHint('Ω')).toMatch(/Ω$/);
  });

  it('min > max is said in words, without field paths', () => {
    const error = inputError({ spec: { min: 0.9, max: 0.7, unit: 'V' }, reading: { value: 0.8, unit: 'V' } });
    expect(error?.field).toBe('spec.min');
    expect(error?.message).toBe('The minimum (0.9 V) is above the maximum (0.7 V): check the limits.');
  });
});

describe('the job reading body forwards the modes (continuity and diode checks go on a job like any reading)', () => {
  it('keeps reading.mode, and spec.mode, nearLimit and engineRpm for limits typed by hand', () => {
    const input: VerdictInput = {
      spec: { max: 0.5, unit: 'Ω', mode: 'continuity', nearLimit: 0.05, engineRpm: null },
      reading: { value: 0.2, unit: 'Ω', mode: 'continuity' },
    };
    const body = toReadingBody(input, { label: 'main fuse' });
    expect(body).toMatchObject({
      spec: { max: 0.5, unit: 'Ω', mode: 'continuity', nearLimit: 0.05 },
      reading: { value: 0.2, unit: 'Ω', mode: 'continuity' },
    });
    expect(ReadingBody.safeParse(body).success).toBe(true);
    expect(toReadingBody(input, { specId: 7 }).reading).toEqual({ value: 0.2, unit: 'Ω', mode: 'continuity' });
  });
});
