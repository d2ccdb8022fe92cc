/**
 * A reading and its corrections as typed (units as text) → the engine's input, each unit
 * read by `unit` (which names the field when it is not one). Shared by the server's
 * verdicts and a test plan step judged on the device, so both build the same input.
 */
import type { CanonicalUnit } from '../units';
import type { MeasurementMode } from '../contracts/enums';
import type { SpecLimits, VerdictInput } from './types';

type Typed = { value: number; unit: string };
export type TypedReading = {
  reading: Typed & { mode?: MeasurementMode };
  leadResistance?: Typed;
  seriesResistance?: Typed & { tolerancePct?: number };
  temperatureC?: number;
  meter?: { percent: number; counts: number; countValue: number; unit: string };
};

export function verdictInputOf(
  spec: SpecLimits,
  typed: TypedReading,
  unit: (u: string, path: string) => CanonicalUnit,
  prefix = '',
): VerdictInput {
  const input: VerdictInput = {
    spec,
    reading: { value: typed.reading.value, unit: unit(typed.reading.unit, `${prefix}reading.unit`) },
  };
  if (typed.reading.mode) input.reading.mode = typed.reading.mode;
  if (typed.leadResistance)
    input.leadResistance = {
      value: typed.leadResistance.value,
      unit: unit(typed.leadResistance.unit, `${prefix}leadResistance.unit`),
    };
  if (typed.seriesResistance)
    input.seriesResistance = {
      ...typed.seriesResistance,
      unit: unit(typed.seriesResistance.unit, `${prefix}seriesResistance.unit`),
    };
  if (typed.temperatureC !== undefined) input.temperatureC = typed.temperatureC;
  if (typed.meter) input.meter = { ...typed.meter, unit: unit(typed.meter.unit, `${prefix}meter.unit`) };
  return input;
}
