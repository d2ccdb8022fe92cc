/**
 * Measurement modes: how the meter is set for a spec, what quantity that mode reads, and the
 * instruction shown first ("Meter on AC volts, engine at 5 000 rpm"). A spec without a mode
 * takes the plain mode of its quantity (volts → DC volts); the library's classifier
 * (lib/specs/classify.ts defaultMode) can do better from the parameter's words.
 */
import { MEASUREMENT_MODE_LABEL, MEASUREMENT_MODES, type MeasurementMode } from '../contracts/enums';
import type { QuantityKind } from '../units';

export { MEASUREMENT_MODES, type MeasurementMode };

export const MODE_KIND: Readonly<Record<MeasurementMode, QuantityKind>> = {
  dc_voltage: 'voltage',
  ac_voltage: 'voltage',
  peak_voltage: 'voltage',
  resistance: 'resistance',
  diode_forward: 'voltage',
  continuity: 'resistance',
  current: 'current',
};

/** The meter setting in a sentence: 'AC volts (rms)', 'resistance (Ω)' (the contracts' labels). */
export const MODE_WORDS: Readonly<Record<MeasurementMode, string>> = Object.fromEntries(
  MEASUREMENT_MODES.map((m) => {
    const label = MEASUREMENT_MODE_LABEL[m];
    return [m, /^[A-Z][a-z]/.test(label) ? label.charAt(0).toLowerCase() + label.slice(1) : label];
  }),
) as Record<MeasurementMode, string>;

export const isMeasurementMode = (v: unknown): v is MeasurementMode =>
  typeof v === 'string' && (MEASUREMENT_MODES as readonly string[]).includes(v);

/** The plain mode of a quantity; a length (feeler gauge) has none. */
export function modeForKind(kind: QuantityKind): MeasurementMode | null {
  return kind === 'voltage' ? 'dc_voltage' : kind === 'length' ? null : kind;
}

/** '5000' → '5 000' (thousands grouped with a space, as workshop manuals print them). */
const grouped = (n: number) => String(Math.round(n)).replace(/\B(?=(\d{3})+(?!\d))/g, ' ');

/** "Meter on AC volts, engine at 5 000 rpm"; a gap: "Feeler gauge". */
export function modeInstruction(mode: MeasurementMode | null, engineRpm?: number | null): string {
  const meter = mode ? `Meter on ${MODE_WORDS[mode]}` : 'Feeler gauge or caliper';
  return engineRpm != null ? `${meter}, engine at ${grouped(engineRpm)} rpm` : meter;
}

/** The first step's label: 'Meter reading on AC volts (rms), engine at 5 000 rpm'; a gap: 'Gauge reading'. */
export function readingLabel(mode: MeasurementMode | null, engineRpm?: number | null): string {
  if (!mode) return 'Gauge reading';
  return `Meter reading on ${modeInstruction(mode, engineRpm).replace(/^Meter on /, '')}`;
}
