/**
 * Knowledge about parameters that the row rules use: which quantity a parameter needs,
 * which parameters are copper windings, and wide plausibility ranges that only ever
 * produce import *warnings*, never rejections (REFERENCES.md §7).
 */
import { convert, type CanonicalUnit, type QuantityKind } from '../units';
import type { RowProblem, SpecCsvColumn } from './columns';

const norm = (s: string) => s.toLowerCase().replace(/\s+/g, ' ').trim();

/** Ordered: the first pattern that matches the parameter decides its quantity kind. */
const KIND_PATTERNS: [RegExp, QuantityKind][] = [
  [/resistance|\bohms?\b|impedance/, 'resistance'],
  [/\bgap\b|clearance|thickness|length/, 'length'],
  [/voltage|\bvolts?\b|\bemf\b/, 'voltage'],
  [/current|\bfuse\b|\bamps?\b|amperage|\bdraw\b/, 'current'],
];

/**
 * The quantity kind a parameter needs, from its wording ('primary winding resistance' →
 * resistance, 'electrode gap' → length, 'charging voltage' → voltage, 'fuse rating' →
 * current). Unknown wording → null, and the unit is then not checked against it.
 */
export function expectedKindForParameter(parameter: string): QuantityKind | null {
  const p = norm(parameter);
  for (const [pattern, kind] of KIND_PATTERNS) if (pattern.test(p)) return kind;
  return null;
}

/**
 * Decision: an empty material cell means 'copper' when the parameter is the resistance of
 * a winding or coil (ignition coil, pickup / pulser, stator), because those are copper and
 * need temperature correction; otherwise 'none'. A parameter that names a cap, lead or
 * resistor (carbon or resistive wire) stays 'none' even if it also mentions the coil.
 */
export function defaultMaterial(parameter: string, kind: QuantityKind): 'copper' | 'none' {
  const p = norm(parameter);
  if (kind !== 'resistance' || /\bcap\b|\blead\b|resistor|\bwire\b/.test(p)) return 'none';
  return /winding|coil|stator|pulser|pulse generator|pickup|pick-up/.test(p) ? 'copper' : 'none';
}

type Range = {
  label: string;
  test: (component: string, parameter: string) => boolean;
  lowOhm: number;
  highOhm: number;
};

/**
 * From memory, low confidence (REFERENCES.md §7 gives primary ≈ 0.2–3 Ω, secondary ≈ 5–30 kΩ,
 * pickup ≈ 150–1500 Ω with no citable handbook). The bounds below are deliberately wide
 * around those ranges so that only a likely typo (wrong unit, misplaced dot) is flagged.
 */
const RESISTANCE_RANGES: Range[] = [
  { label: 'an ignition primary winding', test: (_c, p) => /primary/.test(p), lowOhm: 0.05, highOhm: 20 },
  { label: 'an ignition secondary winding', test: (_c, p) => /secondary/.test(p), lowOhm: 1_000, highOhm: 100_000 },
  {
    label: 'a pickup (pulse generator) coil',
    test: (c, p) => /pickup|pick-up|pulser|pulse generator|pulse coil/.test(`${c} ${p}`),
    lowOhm: 20,
    highOhm: 5_000,
  },
];

type WarnInput = {
  component: string;
  parameter: string;
  unit: CanonicalUnit;
  kind: QuantityKind;
  values: [SpecCsvColumn, number | null][];
};

/** Warnings (not errors) for resistance values far outside what such a winding usually measures. */
export function plausibilityWarnings(input: WarnInput, line: number): RowProblem[] {
  if (input.kind !== 'resistance') return [];
  const c = norm(input.component);
  const p = norm(input.parameter);
  const range = RESISTANCE_RANGES.find((r) => r.test(c, p));
  if (!range) return [];
  const warnings: RowProblem[] = [];
  for (const [column, value] of input.values) {
    if (value === null) continue;
    const ohms = convert(value, input.unit, 'Ω');
    if (ohms < range.lowOhm || ohms > range.highOhm) {
      warnings.push({
        line,
        column,
        reason: `${column} ${value} ${input.unit} is unusual for ${range.label} (usually ${fmtOhm(range.lowOhm)} to ${fmtOhm(range.highOhm)}); check the value and the unit`,
      });
    }
  }
  return warnings;
}

const fmtOhm = (ohm: number) => (ohm >= 1000 ? `${ohm / 1000} kΩ` : `${ohm} Ω`);
