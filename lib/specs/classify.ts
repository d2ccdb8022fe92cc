/**
 * The one classifier of spec parameters, used by the spec screen, the safety cautions, the
 * CSV and editor value rules and the server: which quantity a parameter needs, whether a
 * winding is copper by default, whether a spec is a battery's rest voltage, and which
 * caution categories apply. It knows the trade's synonyms (synonyms.ts), so "OCV" is a
 * rest voltage and a "high tension lead" an ignition lead, as the search finds them.
 */
import type { Material, MeasurementMode, QuantityKind } from '../contracts/enums';
import { SYNONYM_GROUPS, synonymGroupsIn, withSynonyms } from './synonyms';

const norm = (s: string) => s.toLowerCase().replace(/\s+/g, ' ').trim();

/** Ordered: the first pattern that matches the parameter decides its quantity kind. */
const KIND_PATTERNS: [RegExp, QuantityKind][] = [
  [/resistance|\bohms?\b|impedance/, 'resistance'],
  [/\bgap\b|clearance|thickness|length/, 'length'],
  [/voltage|\bvolts?\b|\bemf\b/, 'voltage'],
  [/current|\bfuse\b|\bamps?\b|amperage|\bdraw\b/, 'current'],
];

const kindOfWords = (text: string) => KIND_PATTERNS.find(([pattern]) => pattern.test(text))?.[1] ?? null;

/**
 * The quantity kind a parameter needs, from its wording ('primary winding resistance' →
 * resistance, 'electrode gap' → length, 'charging voltage' → voltage, 'fuse rating' →
 * current), or else from a synonym's wording ('OCV' → rest voltage → voltage). Unknown
 * wording → null, and the unit is then not checked against it.
 */
export function expectedKind(parameter: string): QuantityKind | null {
  return kindOfWords(norm(parameter)) ?? kindOfWords(withSynonyms(parameter));
}

/**
 * Decision: an empty material means 'copper' when the parameter is the resistance of a
 * winding or coil (ignition coil, pickup / pulser, stator), because those are copper and
 * need temperature correction; otherwise 'none'. A parameter that names a cap, lead or
 * resistor (carbon or resistive wire) stays 'none' even if it also mentions the coil.
 * Synonyms are not applied here: a "crank sensor" may be a Hall sensor, not a winding.
 */
export function defaultMaterial(parameter: string, kind: QuantityKind): Material {
  const p = norm(parameter);
  if (kind !== 'resistance' || /\bcap\b|\blead\b|resistor|\bwire\b/.test(p)) return 'none';
  return /winding|coil|stator|pulser|pulse generator|pickup|pick-up/.test(p) ? 'copper' : 'none';
}

/** Ordered: the first pattern that matches a voltage parameter decides its meter mode. */
const VOLTAGE_MODES: [RegExp, MeasurementMode][] = [
  [/\bpeak\b|\bcdi output\b/, 'peak_voltage'],
  [/\bdiode\b|forward voltage|rectifier forward/, 'diode_forward'],
  [
    /\ba\.?c\.?\b|\brms\b|stator output|alternator output|charging coil output|generator output|lighting coil/,
    'ac_voltage',
  ],
];

/**
 * The meter mode a spec is read in when it states none, from its quantity and wording: 'primary
 * peak voltage' → peak volts (through a peak-reading adapter), 'stator output voltage (AC)' → AC
 * volts, 'rectifier diode forward voltage' → the diode range, any other voltage → DC volts; a
 * 'continuity' resistance → continuity; a gap has no meter mode (null).
 */
export function defaultMode(parameter: string, kind: QuantityKind): MeasurementMode | null {
  const p = norm(parameter);
  if (kind === 'voltage') return VOLTAGE_MODES.find(([pattern]) => pattern.test(p))?.[1] ?? 'dc_voltage';
  if (kind === 'resistance') return /continuity/.test(p) ? 'continuity' : 'resistance';
  return kind === 'current' ? 'current' : null;
}

const REST_VOLTAGE = SYNONYM_GROUPS.find((g) => g.includes('rest voltage'))!;

/** A battery's rest (open-circuit) voltage, under any of its trade names: the screen offers the charge estimate. */
export function isRestVoltage(parameter: string): boolean {
  return synonymGroupsIn(parameter).includes(REST_VOLTAGE);
}

export const CAUTION_CATEGORIES = ['high-voltage', 'charging', 'battery'] as const;
export type CautionCategory = (typeof CAUTION_CATEGORIES)[number];

const CAUTION_PATTERNS: Record<CautionCategory, RegExp> = {
  'high-voltage': /secondary|spark|plug lead|ht lead|plug cap|resistor cap|ignition coil|peak voltage|cdi|plug wire/i,
  charging: /stator|charging|regulat|alternator|generator/i,
  battery: /battery|rest voltage|open-circuit voltage/i,
};

/** The caution categories for work on this component and parameter (their synonyms included). */
export function cautionCategories(component: string, parameter: string): CautionCategory[] {
  const text = `${component} ${parameter} | ${withSynonyms(`${component} ${parameter}`)}`;
  return CAUTION_CATEGORIES.filter((c) => CAUTION_PATTERNS[c].test(text));
}

/**
 * The standalone calculator has no spec: the cautions of what it measures ('voltage', DC or AC
 * volts are charging and battery work; peak volts are ignition output, high voltage).
 */
export function cautionCategoriesForMode(mode: string): CautionCategory[] {
  if (mode === 'peak_voltage') return ['high-voltage'];
  return ['voltage', 'dc_voltage', 'ac_voltage'].includes(mode) ? ['charging', 'battery'] : [];
}
