/**
 * Proposals to change a test plan (kind 'plan_change'). The proposed fields are checked by
 * the editors' own rules (plan.service checkPlanChange: shape, graph, the model's parts) when
 * proposed and edited, and accepted through the editors' own write (updatePlanIn): the same
 * version lock, a new plan version and a revision naming the correction, credited to the proposer.
 */
import type { EntityManager } from 'typeorm';
import {
  planCitationIssues,
  toPlanCitation,
  type CitationInput,
  type PlanProposal,
  type PlanProposeBody,
  type ProposedPlan,
} from '@/lib/contracts/corrections';
import { sameJson } from '@/lib/format/canonical-json';
import { isEmptyDiff, planDiff } from '@/lib/plans/diff';
import { AppError } from '@/server/errors/app-error';
import { roleAtLeast, type SignedInUser } from '@/server/auth/roles';
import type { Plan } from '../plans/plan.entity';
import { toPlanBody } from '../plans/plan.mapper';
import { PlanRepository } from '../plans/plan.repository';
import { checkPlanChange, updatePlanIn } from '../plans/plan.service';
import type { Correction } from './correction.entity';
import { assertNotStale, credit } from './correction.apply';
import { proposedOver, proposedPlanOf } from './correction.plan-view';

/** The published plan a contributor may propose against; a draft is not theirs to see (404), nor an editor's to propose on. */
async function proposablePlan(m: EntityManager, id: number, user: SignedInUser): Promise<Plan> {
  const plan = await m.withRepository(PlanRepository).findWithModel(id);
  if (!plan || (plan.status !== 'published' && !roleAtLeast(user.role, 'editor'))) throw AppError.notFound('plan', id);
  if (plan.status !== 'published')
    throw AppError.unprocessable('This plan is a draft: edit it directly instead of proposing a change.', [
      { path: 'planId', message: 'Only a published plan takes proposals' },
    ]);
  return plan;
}

/**
 * The proposed fields checked over the current plan (422 at 'plan.<path>') and stored with the
 * model by id and only where they differ from it (a form sends the whole plan; accepting over
 * a later version must not put back fields the proposer never changed). A proposal that
 * changes nothing is refused.
 */
async function checkedProposal(
  m: EntityManager,
  plan: Plan,
  proposed: ProposedPlan,
  citation: CitationInput,
): Promise<PlanProposal> {
  const issues = planCitationIssues(citation);
  if (issues.length) throw AppError.unprocessable(`The proposal is not valid: ${issues[0].message}.`, issues);
  const before = toPlanBody(plan);
  const { modelId } = await checkPlanChange(m, before, proposed, 'plan.');
  const { model, ...fields } = proposed;
  const all: ProposedPlan = model !== undefined || fields.modelId !== undefined ? { ...fields, modelId } : fields;
  const stored = Object.fromEntries(
    Object.entries(all).filter(([k, v]) => !sameJson(v, before[k as keyof typeof before])),
  ) as ProposedPlan;
  if (isEmptyDiff(planDiff(before, proposedOver(before, { proposed: { plan: stored }, citation: { ...citation } }))))
    throw AppError.unprocessable('The proposal changes nothing in this plan.', [
      { path: 'plan', message: 'Change at least one step or field' },
    ]);
  return { plan: stored };
}

export async function planTarget(m: EntityManager, b: PlanProposeBody, user: SignedInUser) {
  const plan = await proposablePlan(m, b.planId, user);
  if (b.version > plan.version)
    throw AppError.unprocessable(`This plan has no version ${b.version} (it is at version ${plan.version}).`, [
      { path: 'version', message: 'No such version' },
    ]);
  return {
    target: { modelId: plan.modelId, planId: plan.id, what: `the test plan “${plan.title}”` },
    proposed: await checkedProposal(m, plan, b.plan, b.citation),
  };
}

/** The proposer's edit of a pending plan proposal: new fields are checked over the current plan. */
export async function editPlanProposal(
  m: EntityManager,
  c: Correction,
  user: SignedInUser,
  b: { values?: unknown; plan?: ProposedPlan; citation?: CitationInput },
) {
  if (b.values)
    throw AppError.unprocessable('This proposal is about a test plan: send the plan fields, not spec values.', [
      { path: 'values', message: 'Not for a test plan' },
    ]);
  const citation = b.citation ?? c.citation;
  const plan = await proposablePlan(m, c.planId!, user);
  c.proposed = await checkedProposal(m, plan, b.plan ?? proposedPlanOf(c), citation);
}

export async function planTitle(m: EntityManager, c: Correction): Promise<string> {
  const plan = await m.withRepository(PlanRepository).findOneBy({ id: c.planId! });
  return `the test plan “${plan?.title ?? `#${c.planId}`}”`;
}

/** Accepts a plan proposal inside the caller's transaction; a later plan version needs confirmStale (409 otherwise). */
export async function applyPlanChange(m: EntityManager, c: Correction, editor: SignedInUser, confirmStale: boolean) {
  const current = await m.withRepository(PlanRepository).lockById(c.planId!);
  if (!current) throw AppError.notFound('plan', c.planId!);
  await assertNotStale(c, current, confirmStale, 'plan', 'Compare the changes');
  const { actor } = await credit(m, c, editor);
  const reason = `Correction #${c.id}: ${c.rationale.split('\n')[0].trim()}`.slice(0, 500);
  const body = { ...proposedPlanOf(c), citation: toPlanCitation(c.citation), version: current.version, reason };
  await updatePlanIn(m, current.id, body, actor, 'plan.');
}
