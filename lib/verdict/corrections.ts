/**
 * Steps 1–3 of the engine: the reading in the spec's unit, minus the test leads and any
 * series resistor (resistance specs only), then referred to the spec's reference temperature
 * when the winding is copper. Each step is recorded in words and in a formula that ends in
 * its result, each quantity in the unit it was typed in ('16.3 kΩ − 0.4 Ω = 16.2996 kΩ').
 *
 * The arithmetic is exact decimal (decimal.js, lib/units/exact.ts): a conversion or a
 * subtraction of typed decimals gives the decimal a technician would work out by hand
 * (88.57 Ω − 0.17 Ω is 88.40 Ω, not 88.39999999999999). Only the temperature factor, a ratio
 * that does not terminate, is rounded (to 60 significant digits).
 */
import { convertExact, Dec, decimalsOf, formatExact, formatNumber } from '../units';
import { MODE_WORDS } from './modes';
import type { CheckedSpec } from './spec';
import { COPPER_INFERRED_ZERO_C } from './temperature';
import { VerdictInputError, type Quantity, type VerdictInput, type VerdictStep } from './types';
import { optionalFinite, requireTemperature, requireUnit, valueIn } from './validate';

export type Corrected = {
  value: Dec;
  raw: Dec;
  lead?: Dec;
  series?: Dec;
  seriesTolerancePct?: number;
  /** The quantities as typed, for the words. */
  typed: { reading: Quantity; lead?: Quantity; series?: Quantity; temperatureC?: number };
  /** Temperature factor applied (1 when none). */
  factor: Dec;
  /** Decimal places the value is shown with (the reading's own, or what the subtraction needs). */
  decimals: number;
  steps: VerdictStep[];
};

/** A number as typed, with its unit ('0.4 Ω'). */
export const q = (value: number, unit: string) => `${formatNumber(value, 12)} ${unit}`;
/** An exact result with the places the inputs carried. */
export const qx = (value: Dec, unit: string, decimals = 0) => `${formatExact(value, decimals)} ${unit}`;

function checkMode(input: VerdictInput, spec: CheckedSpec): void {
  const mode = input.reading.mode;
  if (mode === undefined || mode === null || mode === spec.mode) return;
  const specSays = spec.mode ? `this spec is read on ${MODE_WORDS[spec.mode]}` : 'this spec is not a meter reading';
  const taken = (MODE_WORDS as Record<string, string>)[mode] ?? `'${String(mode)}'`;
  throw new VerdictInputError('reading.mode', `The reading was taken on ${taken}, but ${specSays}: measure again.`);
}

function readRaw(input: VerdictInput, spec: CheckedSpec, steps: VerdictStep[]): { raw: Dec; typed: Quantity } {
  const { reading } = input;
  valueIn(reading, 'reading', spec.unit);
  const unit = requireUnit(reading.unit, 'reading.unit').unit;
  const raw = convertExact(reading.value, unit, spec.unit);
  steps.push({ label: 'Meter reading', value: reading.value, unit });
  if (unit !== spec.unit) {
    steps.push({
      label: `Converted to the spec unit (${spec.unit})`,
      formula: `${q(reading.value, unit)} = ${qx(raw, spec.unit)}`,
      value: raw.toNumber(),
      unit: spec.unit,
    });
  }
  if (raw.isNegative() && !raw.isZero() && spec.kind !== 'voltage' && spec.kind !== 'current') {
    throw new VerdictInputError('reading', `A ${spec.kind} reading cannot be negative (${q(reading.value, unit)}).`);
  }
  return { raw, typed: { value: reading.value, unit } };
}

function subtraction(field: 'leadResistance' | 'seriesResistance', given: Quantity, spec: CheckedSpec) {
  if (spec.kind !== 'resistance') {
    throw new VerdictInputError(field, `${field} can only be subtracted from a resistance reading, not a ${spec.kind}`);
  }
  valueIn(given, field, spec.unit);
  const unit = requireUnit(given.unit, `${field}.unit`).unit;
  const value = convertExact(given.value, unit, spec.unit);
  if (value.isNegative() && !value.isZero()) throw new VerdictInputError(field, `${field} cannot be negative`);
  return { value, typed: { value: given.value, unit } };
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

/** Places needed to show a - b exactly when both are typed decimals (0.0004 kΩ needs 4). */
const placesIn = (value: Dec) => Math.min(value.decimalPlaces(), 9);

function subtractOne(c: Corrected, spec: CheckedSpec, amount: Dec, typed: Quantity, label: string): void {
  const before = c.value;
  const beforeText =
    c.steps.length > 1 ? qx(before, spec.unit, c.decimals) : q(c.typed.reading.value, c.typed.reading.unit);
  c.value = before.minus(amount);
  c.decimals = Math.max(c.decimals, placesIn(amount));
  c.steps.push({
    label,
    formula: `R = ${beforeText} − ${q(typed.value, typed.unit)} = ${qx(c.value, spec.unit, c.decimals)}`,
    value: c.value.toNumber(),
    unit: spec.unit,
  });
}

function subtractAll(input: VerdictInput, spec: CheckedSpec, c: Corrected): void {
  if (input.leadResistance != null) {
    const { value, typed } = subtraction('leadResistance', input.leadResistance, spec);
    c.lead = value;
    c.typed.lead = typed;
    subtractOne(c, spec, value, typed, 'Test-lead resistance subtracted (probes shorted)');
  }
  if (input.seriesResistance != null) {
    const { value, typed } = subtraction('seriesResistance', input.seriesResistance, spec);
    c.series = value;
    c.typed.series = typed;
    c.seriesTolerancePct = seriesTolerance(input.seriesResistance.tolerancePct);
    subtractOne(c, spec, value, typed, 'Series resistance subtracted (resistor cap or suppressor)');
  }
  // Only a resistance goes through subtraction: a negative voltage or current is judged as it reads.
  if ((c.lead || c.series) && c.value.isNegative() && !c.value.isZero()) {
    throw new VerdictInputError(
      'reading',
      `The reading minus the lead and series resistance is negative (${qx(c.value, spec.unit, c.decimals)}): re-zero the leads or check the series value`,
    );
  }
}

function applyTemperature(input: VerdictInput, spec: CheckedSpec, c: Corrected): void {
  const tRef = spec.refTempC;
  if (input.temperatureC == null) {
    if (spec.copper)
      c.steps.push({
        label: `No winding temperature given: no correction, the reading is taken as at ${tRef} °C`,
        value: c.value.toNumber(),
        unit: spec.unit,
      });
    return;
  }
  const t = requireTemperature(input.temperatureC, 'temperatureC');
  c.typed.temperatureC = t;
  if (!spec.copper) {
    c.steps.push({
      label: 'Temperature recorded; no correction because the part is not a copper winding',
      value: t,
      unit: '°C',
    });
    return;
  }
  const zero = new Dec(COPPER_INFERRED_ZERO_C);
  c.factor = zero.plus(tRef).div(zero.plus(t));
  const before = c.value;
  c.value = before.times(c.factor);
  c.steps.push({
    label: `Referred from ${t} °C to ${tRef} °C (copper, inferred zero −234.5 °C)`,
    formula: `R_${tRef} = ${qx(before, spec.unit, c.decimals)} × (234.5 + ${tRef}) / (234.5 + ${t}) = ${formatExact(c.value, 0, 6)} ${spec.unit}`,
    value: c.value.toNumber(),
    unit: spec.unit,
  });
}

export function applyCorrections(input: VerdictInput, spec: CheckedSpec): Corrected {
  const steps: VerdictStep[] = [];
  checkMode(input, spec);
  const { raw, typed } = readRaw(input, spec, steps);
  const decimals = typed.unit === spec.unit ? decimalsOf(typed.value) : placesIn(raw);
  const c: Corrected = { value: raw, raw, factor: new Dec(1), typed: { reading: typed }, decimals, steps };
  subtractAll(input, spec, c);
  applyTemperature(input, spec, c);
  return c;
}
