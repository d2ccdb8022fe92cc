import type { JobSummaryDto, ReadingDto } from '@/lib/contracts/jobs';
import { checkText, type BeepCheck } from '@/lib/verdict';
import type { Job } from './job.entity';
import type { Reading } from './reading.entity';

export type JobExtras = { ownerName: string; modelTitle: string | null };

export function toReadingDto(r: Reading, currentSpecVersion: number | null): ReadingDto {
  const check = r.inputs.check as BeepCheck | undefined;
  return {
    // A beep-only check has no number to show: what the meter showed, in words.
    ...(check ? { valueText: checkText(check) } : {}),
    id: r.id,
    jobId: r.jobId,
    label: r.label,
    componentName: r.componentName,
    specId: r.specId,
    specVersion: r.specVersion,
    specLimits: r.specLimits,
    inputs: r.inputs,
    verdict: r.verdict,
    value: r.value,
    unit: r.unit,
    expandedUncertainty: r.expandedUncertainty,
    conformanceProbability: r.conformanceProbability,
    reason: r.reason,
    steps: r.steps as ReadingDto['steps'],
    zones: r.zones as ReadingDto['zones'],
    specChangedSince: r.specId !== null && currentSpecVersion !== null && currentSpecVersion !== r.specVersion,
    citation: (r.specLimits.citation as string | undefined) ?? null,
    supersededBy: r.supersededBy,
    takenAt: r.takenAt.toISOString(),
    createdAt: r.createdAt.toISOString(),
    idempotencyKey: r.idempotencyKey,
  };
}

export function toJobSummary(j: Job, extras: JobExtras, readings: Reading[]): JobSummaryDto {
  const counts = { pass: 0, marginal: 0, fail: 0 };
  for (const r of readings) if (r.supersededBy === null) counts[r.verdict] += 1;
  return {
    id: j.id,
    ownerId: j.ownerId,
    ownerName: extras.ownerName,
    modelId: j.modelId,
    modelTitle: extras.modelTitle,
    machineLabel: j.machineLabel,
    machineId: j.machineId,
    customerRef: j.customerRef,
    notes: j.notes,
    status: j.status,
    counts,
    createdAt: j.createdAt.toISOString(),
    updatedAt: j.updatedAt.toISOString(),
  };
}
