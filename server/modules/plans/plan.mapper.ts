import type { PlanBody, PlanDto, PlanRevisionDto, PlanSummaryDto } from '@/lib/contracts/plans';
import { modelTitle } from '@/lib/format/model-title';
import type { Plan } from './plan.entity';
import type { PlanRevision } from './plan-revision.entity';

export function toPlanSummary(p: Plan): PlanSummaryDto {
  return {
    id: p.id,
    title: p.title,
    symptom: p.symptom,
    system: p.system,
    modelId: p.modelId,
    modelTitle: p.model ? modelTitle(p.model) : null,
    status: p.status,
    version: p.version,
    stepCount: p.steps.length,
    updatedAt: p.updatedAt.toISOString(),
  };
}

export const toPlanDto = (p: Plan): PlanDto => ({ ...toPlanSummary(p), citation: p.citation, steps: p.steps });

/** The plan as its file format has it (what a revision keeps and an export writes). */
export function toPlanBody(p: Plan): PlanBody {
  const body: PlanBody = {
    title: p.title,
    symptom: p.symptom,
    system: p.system,
    modelId: p.modelId,
    status: p.status,
    citation: p.citation,
    steps: p.steps,
  };
  if (p.model)
    body.model = { make: p.model.make.name, name: p.model.name, yearFrom: p.model.yearFrom, variant: p.model.variant };
  return body;
}

export const toRevisionDto = (r: PlanRevision): PlanRevisionDto => ({
  id: r.id,
  version: r.version,
  authorName: r.authorName,
  reason: r.reason,
  changedFields: r.changedFields,
  createdAt: r.createdAt.toISOString(),
});
