/**
 * The calculator's form as typed (strings, units picked) → the engine's input.
 * Pure: shared by the inline calculator, the standalone one and their tests.
 * Decimal commas are accepted here (phone keypads in many locales type them).
 */
import type { CanonicalUnit, QuantityKind } from '../units';
import { unitsOfKind } from '../units';
import { evaluateReading, VerdictInputError, type SpecLimits, type VerdictInput, type VerdictResult } from '../verdict';

export type CalculatorForm = {
  reading: string;
  readingUnit: CanonicalUnit;
  lead: string;
  leadUnit: CanonicalUnit;
  series: string;
  seriesUnit: CanonicalUnit;
  seriesTolerancePct: string;
  temperatureC: string;
  meterPercent: string;
  meterCounts: string;
  meterCountValue: string;
  meterUnit: CanonicalUnit;
};

export type FormErrors = Partial<Record<keyof CalculatorForm | 'spec', string>>;

export function emptyForm(unit: CanonicalUnit): CalculatorForm {
  return {
    reading: '',
    readingUnit: unit,
    lead: '',
    leadUnit: unit,
    series: '',
    seriesUnit: unit,
    seriesTolerancePct: '',
    temperatureC: '',
    meterPercent: '',
    meterCounts: '',
    meterCountValue: '',
    meterUnit: unit,
  };
}

/** '3,9' and ' 3.9 ' → 3.9; '' → undefined; anything else → NaN (reported by the caller). */
export function parseDecimal(text: string): number | undefined {
  const t = text.trim().replace(',', '.');
  if (t === '') return undefined;
  return /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t) ? Number(t) : NaN;
}

/** Which optional corrections make sense for a spec of this kind. */
export function correctionsFor(kind: QuantityKind, material: SpecLimits['material']) {
  return {
    leads: kind === 'resistance',
    series: kind === 'resistance',
    temperature: kind === 'resistance' && material === 'copper',
  };
}

const FIELD_OF: Record<string, keyof CalculatorForm | 'spec'> = {
  reading: 'reading',
  'reading.value': 'reading',
  'reading.unit': 'readingUnit',
  leadResistance: 'lead',
  'leadResistance.value': 'lead',
  'leadResistance.unit': 'leadUnit',
  seriesResistance: 'series',
  'seriesResistance.value': 'series',
  'seriesResistance.tolerancePct': 'seriesTolerancePct',
  temperatureC: 'temperatureC',
  meter: 'meterPercent',
  'meter.percent': 'meterPercent',
  'meter.counts': 'meterCounts',
  'meter.countValue': 'meterCountValue',
  'meter.unit': 'meterUnit',
};

export type Calculation = { input: VerdictInput | null; result: VerdictResult | null; errors: FormErrors };

export function calculate(spec: SpecLimits, kind: QuantityKind, form: CalculatorForm): Calculation {
  const errors: FormErrors = {};
  const num = (field: keyof CalculatorForm) => {
    const v = parseDecimal(form[field]);
    if (Number.isNaN(v)) errors[field] = 'Type a number, e.g. 3.9';
    return v;
  };
  const allowed = correctionsFor(kind, spec.material);
  const reading = num('reading');
  const lead = allowed.leads ? num('lead') : undefined;
  const series = allowed.series ? num('series') : undefined;
  const tolerance = allowed.series ? num('seriesTolerancePct') : undefined;
  const temperature = allowed.temperature ? num('temperatureC') : undefined;
  const meter = { percent: num('meterPercent'), counts: num('meterCounts'), countValue: num('meterCountValue') };
  const meterGiven = Object.values(meter).some((v) => v !== undefined);
  if (meterGiven && meter.percent === undefined) errors.meterPercent = 'Give the % of reading (0 if none)';
  if (Object.keys(errors).length || reading === undefined) return { input: null, result: null, errors };

  const input: VerdictInput = { spec, reading: { value: reading, unit: form.readingUnit } };
  if (lead !== undefined) input.leadResistance = { value: lead, unit: form.leadUnit };
  if (series !== undefined) input.seriesResistance = { value: series, unit: form.seriesUnit, tolerancePct: tolerance };
  if (temperature !== undefined) input.temperatureC = temperature;
  if (meterGiven) {
    input.meter = {
      percent: meter.percent ?? 0,
      counts: meter.counts ?? 0,
      countValue: meter.countValue ?? 0,
      unit: form.meterUnit,
    };
  }
  try {
    return { input, result: evaluateReading(input), errors };
  } catch (err) {
    if (!(err instanceof VerdictInputError)) throw err;
    return { input, result: null, errors: { [FIELD_OF[err.field] ?? 'spec']: err.message } };
  }
}

export { unitsOfKind };
