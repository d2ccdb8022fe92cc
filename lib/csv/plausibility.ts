/**
 * Wide plausibility ranges for winding resistances that only ever produce import
 * *warnings*, never rejections (REFERENCES.md §7). Which quantity a parameter needs and
 * which parameters are copper windings is the classifier's (lib/specs/classify.ts).
 */
import { convert, type CanonicalUnit, type QuantityKind } from '../units';
import type { RowProblem, SpecCsvColumn } from './columns';

const norm = (s: string) => s.toLowerCase().replace(/\s+/g, ' ').trim();

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
