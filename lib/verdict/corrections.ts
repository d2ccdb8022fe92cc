/**
 * Steps 1–3 of the engine: the reading in the spec's unit, minus the test leads and any
 * series resistor (resistance specs only), then referred to the spec's reference temperature
 * when the winding is copper. Each step is recorded in words, formula and number.
 */
import { formatNumber, type CanonicalUnit } from '../units';
import type { CheckedSpec } from './spec';
import { copperFactor } from './temperature';
import { VerdictInputError, type Quantity, type VerdictInput, type VerdictStep } from './types';
import { optionalFinite, requireTemperature, requireUnit, valueIn } from './validate';

export type Corrected = {
  value: number;
  raw: number;
  lead?: number;
  series?: number;
  seriesTolerancePct?: number;
  /** Temperature factor applied (1 when none). */
  factor: number;
  steps: VerdictStep[];
};

export const q = (value: number, unit: string) => `${formatNumber(value, 6)} ${unit}`;

function readRaw(reading: Quantity, spec: CheckedSpec, steps: VerdictStep[]): number {
  const raw = valueIn(reading, 'reading', spec.unit);
  const unit = requireUnit(reading.unit, 'reading.unit').unit;
  steps.push({ label: 'Meter reading', value: reading.value, unit });
  if (unit !== spec.unit) {
    steps.push({
      label: `Converted to the spec unit (${spec.unit})`,
      formula: `${q(reading.value, unit)} = ${q(raw, spec.unit)}`,
      value: raw,
      unit: spec.unit,
    });
  }
  if (raw < 0 && spec.kind !== 'voltage' && spec.kind !== 'current') {
    throw new VerdictInputError('reading', `A ${spec.kind} reading cannot be negative (${q(raw, spec.unit)})`);
  }
  return raw;
}

function subtraction(field: 'leadResistance' | 'seriesResistance', given: Quantity, spec: CheckedSpec): number {
  if (spec.kind !== 'resistance') {
    throw new VerdictInputError(field, `${field} can only be subtracted from a resistance reading, not a ${spec.kind}`);
  }
  const value = valueIn(given, field, spec.unit);
  if (value < 0) throw new VerdictInputError(field, `${field} cannot be negative`);
  return value;
}

function seriesTolerance(pct: unknown): number | undefined {
  const value = optionalFinite(pct, 'seriesResistance.tolerancePct');
  if (value !== undefined && (value < 0 || value > 100)) {
    throw new VerdictInputError(
      'seriesResistance.tolerancePct',
      'seriesResistance.tolerancePct must be within 0…100 %',
    );
  }
  return value;
}

function subtractAll(input: VerdictInput, spec: CheckedSpec, c: Corrected): void {
  const unit: CanonicalUnit = spec.unit;
  if (input.leadResistance != null) {
    c.lead = subtraction('leadResistance', input.leadResistance, spec);
    const before = c.value;
    c.value -= c.lead;
    c.steps.push({
      label: 'Test-lead resistance subtracted (probes shorted)',
      formula: `R = ${q(before, unit)} − ${q(c.lead, unit)}`,
      value: c.value,
      unit,
    });
  }
  if (input.seriesResistance != null) {
    c.series = subtraction('seriesResistance', input.seriesResistance, spec);
    c.seriesTolerancePct = seriesTolerance(input.seriesResistance.tolerancePct);
    const before = c.value;
    c.value -= c.series;
    c.steps.push({
      label: 'Series resistance subtracted (resistor cap or suppressor)',
      formula: `R = ${q(before, unit)} − ${q(c.series, unit)}`,
      value: c.value,
      unit,
    });
  }
  if (c.value < 0) {
    throw new VerdictInputError(
      'reading',
      `The reading minus the lead and series resistance is negative (${q(c.value, unit)}): re-zero the leads or check the series value`,
    );
  }
}

function applyTemperature(input: VerdictInput, spec: CheckedSpec, c: Corrected): void {
  const tRef = spec.refTempC;
  if (input.temperatureC == null) {
    if (spec.copper)
      c.steps.push({
        label: `No winding temperature given: no correction, the reading is taken as at ${tRef} °C`,
        value: c.value,
        unit: spec.unit,
      });
    return;
  }
  const t = requireTemperature(input.temperatureC, 'temperatureC');
  if (!spec.copper) {
    c.steps.push({
      label: 'Temperature recorded; no correction because the part is not a copper winding',
      value: t,
      unit: '°C',
    });
    return;
  }
  c.factor = copperFactor(t, tRef);
  const before = c.value;
  c.value *= c.factor;
  c.steps.push({
    label: `Referred from ${t} °C to ${tRef} °C (copper, inferred zero −234.5 °C)`,
    formula: `R_${tRef} = ${q(before, spec.unit)} × (234.5 + ${tRef}) / (234.5 + ${t})`,
    value: c.value,
    unit: spec.unit,
  });
}

export function applyCorrections(input: VerdictInput, spec: CheckedSpec): Corrected {
  const steps: VerdictStep[] = [];
  const raw = readRaw(input.reading, spec, steps);
  const c: Corrected = { value: raw, raw, factor: 1, steps };
  subtractAll(input, spec, c);
  applyTemperature(input, spec, c);
  return c;
}
