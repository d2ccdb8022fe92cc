import { formatNumber } from '../units';
import type { VerdictResult } from '../verdict';

/** The verdict and its working as plain text, for the clipboard or a job note. */
export function explainVerdict(result: VerdictResult): string {
  const head =
    `Verdict: ${result.verdict.toUpperCase()} — ${formatNumber(result.value, 6)} ${result.unit}` +
    (result.expandedUncertainty !== null
      ? ` ± ${formatNumber(result.expandedUncertainty, 3)} ${result.unit} (k = 2)`
      : '');
  const steps = result.steps.map(
    (s, i) =>
      `${i + 1}. ${s.label}${s.formula ? `: ${s.formula}` : ''} = ${formatNumber(s.value, 6)}${s.unit ? ` ${s.unit}` : ''}`,
  );
  return [head, result.reason, ...steps].join('\n');
}
