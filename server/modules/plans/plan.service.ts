/**
 * Test plans in the library: listing the published plans that apply to a model (generic
 * ones included), reading one, and the editors' writes. Every write checks the plan's graph
 * (lib/plans/validate.ts) and, for a model-specific plan, that its model has every component
 * and parameter the steps name (422 naming the step); each version appends a PlanRevision.
 */
import type { EntityManager } from 'typeorm';
import {
  SYSTEM_LABELS,
  SYSTEMS,
  type PlanBody,
  type PlanDto,
  type PlanProblem,
  type PlansQuery,
  type PlanSummaryDto,
  type UpdatePlanBody,
} from '@/lib/contracts/plans';
import { appliesTo, fitProblems } from '@/lib/plans/applicability';
import { planProblems } from '@/lib/plans/validate';
import type { Actor } from '@/server/auth/actor';
import type { SignedInUser } from '@/server/auth/roles';
import { roleAtLeast } from '@/server/auth/roles';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import { foldKey } from '../library/keys';
import { VehicleModel } from '../library/vehicle-model.entity';
import type { Plan } from './plan.entity';
import { toPlanBody, toPlanDto, toPlanSummary, toRevisionDto } from './plan.mapper';
import { modelParts, PlanRepository, PlanRevisionRepository } from './plan.repository';

const words = (s: string) =>
  foldKey(s)
    .split(/[^a-z0-9]+/)
    .filter(Boolean);

/** 0 when some query word matches nothing; more when words match the title or symptom (not just the system). */
function textScore(p: Plan, q: string): number {
  const head = words(`${p.title} ${p.symptom}`);
  const all = [...head, ...words(`${SYSTEM_LABELS[p.system]} ${p.steps.map((s) => s.title).join(' ')}`)];
  let score = 0;
  for (const w of words(q)) {
    if (head.some((h) => h.startsWith(w))) score += 2;
    else if (all.some((h) => h.startsWith(w))) score += 1;
    else return 0;
  }
  return score;
}

export async function listPlans(query: PlansQuery, user?: SignedInUser): Promise<PlanSummaryDto[]> {
  const editor = user !== undefined && roleAtLeast(user.role, 'editor');
  let plans = (await PlanRepository.listWithModels()).filter((p) => p.status === 'published' || editor);
  if (query.system) plans = plans.filter((p) => p.system === query.system);
  if (query.modelId !== undefined) {
    const parts = await modelParts(query.modelId);
    plans = plans.filter((p) =>
      p.modelId === null ? parts.length > 0 && appliesTo(p.steps, parts) : p.modelId === query.modelId,
    );
  }
  const order = (p: Plan) => SYSTEMS.indexOf(p.system);
  if (!query.q) return plans.sort((a, b) => order(a) - order(b) || a.title.localeCompare(b.title)).map(toPlanSummary);
  return plans
    .map((p) => ({ p, score: textScore(p, query.q!) }))
    .filter((x) => x.score > 0)
    .sort((a, b) => b.score - a.score || order(a.p) - order(b.p))
    .map((x) => toPlanSummary(x.p));
}

export async function getPlan(id: number, user?: SignedInUser): Promise<PlanDto> {
  const plan = await PlanRepository.findWithModel(id);
  const editor = user !== undefined && roleAtLeast(user.role, 'editor');
  if (!plan || (plan.status !== 'published' && !editor)) throw AppError.notFound('plan', id);
  return toPlanDto(plan);
}

export async function resolveModelId(
  body: Pick<PlanBody, 'model' | 'modelId'>,
  m: EntityManager,
  prefix = '',
): Promise<number | null> {
  if (!body.model) {
    if (body.modelId !== null && !(await m.existsBy(VehicleModel, { id: body.modelId })))
      throw AppError.unprocessable(`No model with id ${body.modelId}.`, [
        { path: `${prefix}modelId`, message: 'No such model' },
      ]);
    return body.modelId;
  }
  const k = body.model;
  const found = await m
    .getRepository(VehicleModel)
    .createQueryBuilder('vm')
    .innerJoin('vm.make', 'mk')
    .where('mk.nameKey = :make AND LOWER(vm.name) = :name AND vm.yearFrom = :year AND LOWER(vm.variant) = :variant', {
      make: foldKey(k.make),
      name: foldKey(k.name),
      year: k.yearFrom,
      variant: foldKey(k.variant),
    })
    .getOne();
  if (!found)
    throw AppError.unprocessable('The plan names a model the library lacks.', [
      { path: `${prefix}model`, message: 'No such model' },
    ]);
  return found.id;
}

/** The plan's problems, or a 422 naming them (paths under `prefix`, e.g. 'plans.2.'). */
async function checkPlan(body: PlanBody, modelId: number | null, m: EntityManager, prefix = ''): Promise<void> {
  const problems: PlanProblem[] = planProblems(body.steps);
  if (problems.length === 0 && modelId !== null)
    problems.push(...fitProblems(body.steps, await modelParts(modelId, m), true));
  if (problems.length)
    throw AppError.unprocessable(
      problems[0].message,
      problems.map((p) => ({ ...p, path: prefix + p.path })),
    );
}

const changed = (before: PlanBody | null, after: PlanBody) =>
  (Object.keys(after) as (keyof PlanBody)[]).filter(
    (k) => !before || JSON.stringify(before[k]) !== JSON.stringify(after[k]),
  );

async function writeRevision(m: EntityManager, plan: Plan, before: PlanBody | null, actor: Actor, reason: string) {
  const snapshot = toPlanBody(plan);
  await m.withRepository(PlanRevisionRepository).save({
    planId: plan.id,
    version: plan.version,
    snapshot,
    changedFields: changed(before, snapshot),
    authorId: actor.id,
    authorName: actor.name,
    reason,
  });
}

export async function createPlanIn(
  m: EntityManager,
  body: PlanBody,
  actor: Actor,
  reason: string,
  prefix = '',
): Promise<Plan> {
  const modelId = await resolveModelId(body, m, prefix);
  await checkPlan(body, modelId, m, prefix);
  const { model: _key, ...fields } = body;
  const plans = m.withRepository(PlanRepository);
  const saved = await plans.save(plans.create({ ...fields, modelId, version: 1 }));
  const plan = (await plans.findWithModel(saved.id))!;
  await writeRevision(m, plan, null, actor, reason);
  return plan;
}

export async function createPlan(body: PlanBody, actor: Actor): Promise<PlanDto> {
  return toPlanDto(await AppDataSource.transaction((m) => createPlanIn(m, body, actor, 'Created')));
}

/**
 * The plan with `changes` over `before`, checked by the editors' rules (422 at the changed
 * field's path under `prefix`), and the model it resolves to. Writes nothing: an edit and a
 * contributor's proposal (corrections) share it.
 */
export async function checkPlanChange(
  m: EntityManager,
  before: PlanBody,
  changes: Partial<PlanBody>,
  prefix = '',
): Promise<{ next: PlanBody; modelId: number | null }> {
  // A new modelId without a model key replaces the old key; a new key wins over both.
  const next: PlanBody = {
    ...before,
    ...changes,
    model: changes.model ?? (changes.modelId !== undefined ? undefined : before.model),
  };
  const modelId = await resolveModelId(next, m, prefix);
  await checkPlan(next, modelId, m, prefix);
  return { next, modelId };
}

export async function updatePlanIn(
  m: EntityManager,
  id: number,
  body: UpdatePlanBody,
  actor: Actor,
  prefix = '',
): Promise<Plan> {
  const plans = m.withRepository(PlanRepository);
  if (!(await plans.lockById(id))) throw AppError.notFound('plan', id);
  const current = (await plans.findWithModel(id))!;
  if (current.version !== body.version)
    throw AppError.conflict(`This plan was changed since version ${body.version}.`, { current: toPlanDto(current) });
  const before = toPlanBody(current);
  const { version: _v, reason, ...changes } = body;
  const { next, modelId } = await checkPlanChange(m, before, changes, prefix);
  const { model: _key, ...fields } = next;
  await plans.update(id, { ...fields, modelId, version: current.version + 1 });
  const saved = (await plans.findWithModel(id))!;
  await writeRevision(m, saved, before, actor, reason);
  return saved;
}

export async function updatePlan(id: number, body: UpdatePlanBody, actor: Actor): Promise<PlanDto> {
  return toPlanDto(await AppDataSource.transaction((m) => updatePlanIn(m, id, body, actor)));
}

export async function planRevisions(id: number) {
  if (!(await PlanRepository.existsBy({ id }))) throw AppError.notFound('plan', id);
  return (await PlanRevisionRepository.listFor(id)).map(toRevisionDto);
}
