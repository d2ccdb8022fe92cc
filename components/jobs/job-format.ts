/**
 * Words for the job sheet and its report: the machine's name, the verdict counts, the
 * readings grouped by component, the corrections as typed. Pure (no React).
 */
import { MEASUREMENT_MODE_LABEL, type MeasurementMode } from '@/lib/contracts/enums';
import type { JobSummaryDto, ReadingDto } from '@/lib/contracts/jobs';
import { capitalised } from '@/lib/format/capitalised';
import { isLocalJobId } from '@/lib/offline/reading-queue';
import { formatNumber, formatRange, type CanonicalUnit } from '@/lib/units';
import type { VerdictResult, VerdictStep } from '@/lib/verdict';

export const OTHER_CHECKS = 'Other checks';

/** "job #12"; a job started on this device and not yet sent has no number yet. */
export function jobRef(id: number): string {
  return isLocalJobId(id) ? 'the new job (not sent yet)' : `job #${id}`;
}

/** "#12" before a job's machine in lists; "New, not sent yet" for one queued on this device. */
export function jobTag(id: number): string {
  return isLocalJobId(id) ? 'New, not sent yet' : `#${id}`;
}

export function machineName(job: Pick<JobSummaryDto, 'id' | 'modelTitle' | 'machineLabel'>): string {
  if (job.modelTitle && job.machineLabel) return `${job.modelTitle} — ${job.machineLabel}`;
  return job.modelTitle ?? (job.machineLabel || capitalised(jobRef(job.id)));
}

/** "7 pass · 1 marginal · 1 fail": in words, never colour alone. */
export function countsText(c: JobSummaryDto['counts']): string {
  return `${c.pass} pass · ${c.marginal} marginal · ${c.fail} fail`;
}

/** Groups in the order their first reading was taken; hand-typed checks last, as "Other checks". */
export function groupByComponent<T extends { componentName: string }>(
  readings: T[],
): { component: string; readings: T[] }[] {
  const groups = new Map<string, T[]>();
  for (const r of readings) {
    const name = r.componentName.trim() || OTHER_CHECKS;
    groups.set(name, [...(groups.get(name) ?? []), r]);
  }
  const named = [...groups.entries()].filter(([k]) => k !== OTHER_CHECKS);
  const other = groups.get(OTHER_CHECKS);
  return [...named, ...(other ? [[OTHER_CHECKS, other] as const] : [])].map(([component, rs]) => ({
    component,
    readings: rs,
  }));
}

/** 'ignition coil (rear)' → 'Ignition coil (rear)'. */
export const sentenceCase = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

export function formatWhen(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}

export function asVerdictResult(r: ReadingDto): VerdictResult {
  return {
    verdict: r.verdict,
    value: r.value,
    unit: r.unit as CanonicalUnit,
    expandedUncertainty: r.expandedUncertainty,
    conformanceProbability: r.conformanceProbability,
    reason: r.reason,
    explanation: r.explanation ?? r.reason,
    valueText: r.valueText ?? formatNumber(r.value, 6),
    steps: r.steps,
    zones: r.zones,
  };
}

/** The result as shown on the sheet: '2.81 Ω ± 0.05 Ω', or a beep-only check's words. */
export function resultText(
  r: Pick<ReadingDto, 'value' | 'unit' | 'expandedUncertainty' | 'valueText' | 'inputs'>,
): string {
  if (r.inputs.check) return r.valueText ?? '';
  const u = r.expandedUncertainty !== null ? ` ± ${formatNumber(r.expandedUncertainty, 2)} ${r.unit}` : '';
  return `${formatNumber(r.value)} ${r.unit}${u}`;
}

/** A beep-only check (no limits, no band to draw). */
export const isCheck = (r: Pick<ReadingDto, 'inputs'>) => r.inputs.check !== undefined;

type Q = { value: number; unit: string };
const q = (x: Q) => `${formatNumber(x.value)} ${x.unit}`;

/** The raw reading and each correction, as the technician entered them. */
export function inputLines(inputs: Record<string, unknown>): string[] {
  const i = inputs as {
    reading?: Q;
    leadResistance?: Q;
    seriesResistance?: Q & { tolerancePct?: number };
    temperatureC?: number;
    meter?: { percent: number; counts: number; countValue: number; unit: string };
  };
  const lines: string[] = [];
  if (i.reading) lines.push(`Meter reading ${q(i.reading)}`);
  if (i.leadResistance) lines.push(`Test leads ${q(i.leadResistance)} subtracted`);
  if (i.seriesResistance) {
    const tol =
      i.seriesResistance.tolerancePct !== undefined ? ` (±${formatNumber(i.seriesResistance.tolerancePct)} %)` : '';
    lines.push(`Series resistor ${q(i.seriesResistance)}${tol} subtracted`);
  }
  if (i.temperatureC !== undefined) lines.push(`Winding at ${formatNumber(i.temperatureC)} °C`);
  if (i.meter)
    lines.push(
      `Meter accuracy ±(${formatNumber(i.meter.percent)} % + ${formatNumber(i.meter.counts)} counts of ${formatNumber(i.meter.countValue)} ${i.meter.unit})`,
    );
  return lines;
}

/** "2.4–3.2 Ω (nominal 2.8) at 20 °C" from the limits kept with a reading. */
export function limitsText(limits: Record<string, unknown>): string {
  const n = (k: string) => (typeof limits[k] === 'number' ? (limits[k] as number) : null);
  const mode = limits.mode as MeasurementMode | undefined;
  if (n('min') === null && n('max') === null && n('nominal') === null && mode)
    return `${MEASUREMENT_MODE_LABEL[mode]} check`;
  const temp = n('refTempC') !== null && limits.material === 'copper' ? ` at ${formatNumber(n('refTempC')!)} °C` : '';
  return `${formatRange(n('min'), n('nominal'), n('max'), String(limits.unit ?? '') as CanonicalUnit)}${temp}`;
}

/** One working step on a line: 'label: formula = value unit' (formulas that end in their result are not repeated). */
export function stepText(s: VerdictStep): string {
  // A beep-only check's steps are words ('conducts', 'yes'); their 1/0 is for the record only.
  if (!s.unit && s.formula && /^[a-z ]+$/i.test(s.formula)) return `${s.label}: ${s.formula}`;
  const result = `${formatNumber(s.value, 6)}${s.unit ? ` ${s.unit}` : ''}`;
  if (!s.formula) return `${s.label} = ${result}`;
  return s.formula.includes('=') ? `${s.label}: ${s.formula}` : `${s.label}: ${s.formula} = ${result}`;
}

/** 'Dec 2, 2026, 2:28 AM – 3:10 PM' (the date once when both ends fall on one day). */
export function formatSpan(fromIso: string, toIso: string): string {
  const from = formatWhen(fromIso);
  const to = formatWhen(toIso);
  if (from === to) return from;
  const day = (iso: string) => new Date(iso).toDateString();
  if (day(fromIso) !== day(toIso)) return `${from} – ${to}`;
  return `${from} – ${new Date(toIso).toLocaleTimeString(undefined, { timeStyle: 'short' })}`;
}
