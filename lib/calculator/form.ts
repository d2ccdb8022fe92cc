/**
 * The calculator's form as typed (strings, units picked) → the engine's input.
 * Pure: shared by the inline calculator, the standalone one and their tests.
 * Decimal commas are accepted here (phone keypads in many locales type them).
 *
 * Units of the corrections: test leads are always typed (and remembered) in Ω, whatever the
 * spec's unit — a lead reads 0.3–1.6 Ω, and "0.4" on a kΩ spec must not become 400 Ω. A series
 * resistor (a resistor cap) defaults to kΩ, the unit such parts are sold in.
 */
import type { CanonicalUnit, QuantityKind } from '../units';
import { unitsOfKind } from '../units';
import {
  evaluateReading,
  VerdictInputError,
  type MeasurementMode,
  type SpecLimits,
  type VerdictInput,
  type VerdictResult,
} from '../verdict';

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

export const LEAD_UNIT: CanonicalUnit = 'Ω';
export const SERIES_UNIT: CanonicalUnit = 'kΩ';

export function emptyForm(unit: CanonicalUnit): CalculatorForm {
  return {
    reading: '',
    readingUnit: unit,
    lead: '',
    leadUnit: LEAD_UNIT,
    series: '',
    seriesUnit: SERIES_UNIT,
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

/** The last digit of a typical range in the spec's own unit: the count hint's example. */
const COUNT_EXAMPLE: Record<CanonicalUnit, string> = {
  Ω: '0.1 Ω',
  kΩ: '0.01 kΩ',
  MΩ: '0.001 MΩ',
  V: '0.01 V',
  mV: '0.1 mV',
  A: '0.01 A',
  mA: '0.1 mA',
  mm: '0.01 mm',
  in: '0.001 in',
  thou: '0.1 thou',
};

export const countHint = (unit: CanonicalUnit) => `The last digit on the range used, e.g. ${COUNT_EXAMPLE[unit]}`;

const FIELD_OF: Record<string, keyof CalculatorForm | 'spec'> = {
  reading: 'reading',
  'reading.value': 'reading',
  'reading.unit': 'readingUnit',
  'reading.mode': 'reading',
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

type Parsed = { reading?: number; lead?: number; series?: number; tolerance?: number; temperature?: number };

function parseForm(spec: SpecLimits, kind: QuantityKind, form: CalculatorForm, errors: FormErrors) {
  const num = (field: keyof CalculatorForm) => {
    const v = parseDecimal(form[field]);
    if (Number.isNaN(v)) errors[field] = 'Type a number, e.g. 3.9';
    return v;
  };
  const allowed = correctionsFor(kind, spec.material);
  const parsed: Parsed = {
    reading: num('reading'),
    lead: allowed.leads ? num('lead') : undefined,
    series: allowed.series ? num('series') : undefined,
    tolerance: allowed.series ? num('seriesTolerancePct') : undefined,
    temperature: allowed.temperature ? num('temperatureC') : undefined,
  };
  const meter = { percent: num('meterPercent'), counts: num('meterCounts'), countValue: num('meterCountValue') };
  const meterGiven = Object.values(meter).some((v) => v !== undefined);
  if (meterGiven && meter.percent === undefined) errors.meterPercent = 'Give the % of reading (0 if none)';
  return { parsed, meter: meterGiven ? meter : null };
}

export function calculate(
  spec: SpecLimits,
  kind: QuantityKind,
  form: CalculatorForm,
  mode?: MeasurementMode | null,
): Calculation {
  const errors: FormErrors = {};
  const { parsed, meter } = parseForm(spec, kind, form, errors);
  if (Object.keys(errors).length || parsed.reading === undefined) return { input: null, result: null, errors };

  const input: VerdictInput = { spec, reading: { value: parsed.reading, unit: form.readingUnit } };
  if (mode) input.reading.mode = mode;
  if (parsed.lead !== undefined) input.leadResistance = { value: parsed.lead, unit: form.leadUnit };
  if (parsed.series !== undefined)
    input.seriesResistance = { value: parsed.series, unit: form.seriesUnit, tolerancePct: parsed.tolerance };
  if (parsed.temperature !== undefined) input.temperatureC = parsed.temperature;
  if (meter) {
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
