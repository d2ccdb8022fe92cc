/**
 * What the calculator remembers between checks on this device, and how it is offered back.
 * The test leads are remembered in Ω and offered only on resistance checks; the meter accuracy
 * is remembered per quantity (a meter's volts accuracy is not its ohms accuracy) with its count
 * unit. A remembered value is shown as a chip ("from your last check — clear"), never applied
 * silently, and never to a different quantity.
 */
import type { CanonicalUnit, QuantityKind } from '../units';
import type { CalculatorForm } from './form';

export type MeterFields = Pick<CalculatorForm, 'meterPercent' | 'meterCounts' | 'meterCountValue' | 'meterUnit'>;

export type MeterMemory = {
  /** Test-lead resistance in Ω, as typed. */
  leadOhms: string;
  meter: Partial<Record<QuantityKind, MeterFields>>;
};

export const EMPTY_MEMORY: MeterMemory = { leadOhms: '', meter: {} };

/** What a check of this kind may take from memory (nothing that belongs to another quantity). */
export function recall(memory: MeterMemory, kind: QuantityKind, specUnit: CanonicalUnit): Partial<CalculatorForm> {
  const recalled: Partial<CalculatorForm> = {};
  if (kind === 'resistance' && memory.leadOhms.trim() !== '') {
    recalled.lead = memory.leadOhms;
    recalled.leadUnit = 'Ω';
  }
  const meter = memory.meter[kind];
  if (meter && [meter.meterPercent, meter.meterCounts, meter.meterCountValue].some((v) => v.trim() !== '')) {
    Object.assign(recalled, meter);
    if (!meter.meterUnit) recalled.meterUnit = specUnit;
  }
  return recalled;
}

/** The memory after a check of this kind was typed: the leads in Ω, the meter under its quantity. */
export function memorise(memory: MeterMemory, kind: QuantityKind, form: CalculatorForm): MeterMemory {
  const meter: MeterFields = {
    meterPercent: form.meterPercent,
    meterCounts: form.meterCounts,
    meterCountValue: form.meterCountValue,
    meterUnit: form.meterUnit,
  };
  return {
    leadOhms: kind === 'resistance' && form.leadUnit === 'Ω' ? form.lead : memory.leadOhms,
    meter: { ...memory.meter, [kind]: meter },
  };
}

/** Reads a stored memory, dropping what an older version kept (its leads were in the spec's unit). */
export function parseMemory(text: string | null): MeterMemory {
  if (!text) return EMPTY_MEMORY;
  try {
    const m = JSON.parse(text) as Partial<MeterMemory>;
    return {
      leadOhms: typeof m.leadOhms === 'string' ? m.leadOhms : '',
      meter: m.meter && typeof m.meter === 'object' ? m.meter : {},
    };
  } catch {
    return EMPTY_MEMORY;
  }
}
