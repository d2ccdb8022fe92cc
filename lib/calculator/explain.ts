import { formatNumber } from '../units';
import type { VerdictResult } from '../verdict';

/** The verdict, its plain words and its working as plain text, for the clipboard or a job note. */
export function explainVerdict(result: VerdictResult): string {
  const head =
    `Verdict: ${result.verdict.toUpperCase()} — ${result.valueText} ${result.unit}` +
    (result.expandedUncertainty !== null
      ? ` ± ${formatNumber(result.expandedUncertainty, 3)} ${result.unit} (k = 2)`
      : '');
  const steps = result.steps.map((s, i) => {
    const tail = s.formula?.includes('=') ? '' : ` = ${formatNumber(s.value, 6)}${s.unit ? ` ${s.unit}` : ''}`;
    return `${i + 1}. ${s.label}${s.formula ? `: ${s.formula}` : ''}${tail}`;
  });
  return [head, result.explanation, result.reason, ...steps].join('\n');
}
