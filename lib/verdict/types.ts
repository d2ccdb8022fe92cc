/**
 * Types of the verdict engine (DESIGN.md §3). POST /api/verdicts maps 1:1 onto
 * `VerdictInput` → `VerdictResult`, so these shapes are a public contract.
 */
import type { MeasurementMode } from '../contracts/enums';
import type { CanonicalUnit } from '../units';

export type Verdict = 'pass' | 'marginal' | 'fail';

export type SpecLimits = {
  min?: number | null;
  nominal?: number | null;
  max?: number | null;
  unit: CanonicalUnit;
  /** Temperature the limits are quoted at; default 20 °C. */
  refTempC?: number | null;
  material?: 'copper' | 'none' | null;
  /**
   * Near-limit band used when the uncertainty is unknown, as a % of the tolerance width (two-sided;
   * default 5) or of the limit (one-sided; no band unless stated).
   */
  nearLimitPct?: number | null;
  /** The same band as an absolute amount in the spec's unit; wins over nearLimitPct. */
  nearLimit?: number | null;
  /** How the meter is set; inferred from the unit's quantity when absent. */
  mode?: MeasurementMode | null;
  /** Engine speed the reading is taken at (stator output, charging voltage), rpm. */
  engineRpm?: number | null;
};

export type Quantity = { value: number; unit: CanonicalUnit };

/** The meter reading, with the mode the meter was on when it matters. */
export type Reading = Quantity & { mode?: MeasurementMode };

/** Handheld meter accuracy: ±(percent of reading + counts × countValue). */
export type MeterAccuracy = { percent: number; counts: number; countValue: number; unit: CanonicalUnit };

export type VerdictInput = {
  spec: SpecLimits;
  reading: Reading;
  /** Probes shorted together; subtracted from the reading. */
  leadResistance?: Quantity;
  /** Resistor cap / suppressor lead in series; subtracted, its tolerance adds uncertainty. */
  seriesResistance?: Quantity & { tolerancePct?: number };
  /** Winding temperature at the time of reading, °C. */
  temperatureC?: number;
  meter?: MeterAccuracy;
};

export type VerdictStep = { label: string; formula?: string; value: number; unit: string };

export type VerdictZones = { lower?: number; upper?: number; nearBand?: number; interval?: [number, number] };

export type VerdictResult = {
  verdict: Verdict;
  value: number;
  unit: CanonicalUnit;
  /** U with k = 2, in the spec's unit; null when no meter accuracy was given. */
  expandedUncertainty: number | null;
  /** p_c for a normal PDF with u = U/2; null when U is unknown. */
  conformanceProbability: number | null;
  /** The formal one-line reason (limits, interval, ILAC zone). */
  reason: string;
  /** The same verdict in workshop words, corrections first. */
  explanation: string;
  /** The value as shown: the precision the reading and corrections carried ('88.40', '16.2996'). */
  valueText: string;
  steps: VerdictStep[];
  zones: VerdictZones;
};

export type QualitativeResult = { verdict: Verdict; reason: string; steps: VerdictStep[] };

/** A bad input, named by its field path ('reading.unit', 'spec.min', 'temperatureC'…) for a 400 answer. */
export class VerdictInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    Object.setPrototypeOf(this, new.target.prototype);
    this.name = 'VerdictInputError';
    this.field = field;
  }
}
