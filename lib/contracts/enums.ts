/**
 * The domain's closed sets of values, declared once: the TypeORM entities (column enums),
 * the request schemas and the DTOs all take them from here.
 */
import type { QuantityKind } from '../units';

export type { CanonicalUnit, QuantityKind } from '../units';

/** Every quantity a spec can measure, in the order the database enum lists them. */
export const QUANTITY_KINDS = ['resistance', 'voltage', 'current', 'length'] as const satisfies readonly QuantityKind[];

/** A winding's material: copper resistance is corrected for temperature; none is not. */
export const MATERIALS = ['copper', 'none'] as const;
export type Material = (typeof MATERIALS)[number];

/**
 * The meter mode a check is made in. Charging and ignition checks are not all DC: stator
 * output is AC volts at an engine speed, ignition primary output is a peak voltage through a
 * peak-reading adapter, a diode is checked on the meter's diode range.
 */
export const MEASUREMENT_MODES = [
  'dc_voltage',
  'ac_voltage',
  'peak_voltage',
  'resistance',
  'diode_forward',
  'continuity',
  'current',
] as const;
export type MeasurementMode = (typeof MEASUREMENT_MODES)[number];

/** How the meter is set for each mode, as the first instruction of a check reads it. */
export const MEASUREMENT_MODE_LABEL: Readonly<Record<MeasurementMode, string>> = {
  dc_voltage: 'DC volts',
  ac_voltage: 'AC volts (rms)',
  peak_voltage: 'Peak volts (peak-reading adapter)',
  resistance: 'Resistance (Ω)',
  diode_forward: 'Diode range (forward voltage)',
  continuity: 'Continuity (beep)',
  current: 'Current (amps)',
};

/** A diode or continuity test on a meter that only beeps: the probe conducts, or it does not. */
export const DIODE_STATES = ['conducts', 'open'] as const;
export type DiodeState = (typeof DIODE_STATES)[number];

/** The beep-only checks a job can keep, and the measurement mode each belongs to. */
export const CHECK_KINDS = ['diode', 'continuity'] as const;
export type CheckKind = (typeof CHECK_KINDS)[number];
export const CHECK_KIND_MODE: Readonly<Record<CheckKind, MeasurementMode>> = {
  diode: 'diode_forward',
  continuity: 'continuity',
};

export const SPEC_STATUSES = ['published', 'draft'] as const;
export type SpecStatus = (typeof SPEC_STATUSES)[number];

/** What wrote a revision. */
export const REVISION_ORIGINS = ['edit', 'import', 'correction', 'revert'] as const;
export type RevisionOrigin = (typeof REVISION_ORIGINS)[number];

export const IMPORT_STATUSES = ['previewed', 'committed', 'failed'] as const;
export type ImportStatus = (typeof IMPORT_STATUSES)[number];

/** What a proposal is about: a spec (changed, missing, on a missing component) or a test plan. */
export const CORRECTION_KINDS = ['change', 'new_spec', 'new_component', 'plan_change'] as const;
export type CorrectionKind = (typeof CORRECTION_KINDS)[number];

export const CORRECTION_STATUSES = ['pending', 'accepted', 'rejected', 'withdrawn'] as const;
export type CorrectionStatus = (typeof CORRECTION_STATUSES)[number];

/** Roles, from least to most trusted; each role may do everything the ones before it may. */
export const ROLES = ['contributor', 'editor', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/** One problem with one field of a request, as a 400/422 problem lists them. */
export type FieldError = { path: string; message: string };
