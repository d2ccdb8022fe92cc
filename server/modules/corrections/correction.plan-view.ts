/**
 * A plan proposal as its reviewers see it: the plan with the proposal over it (the proposal's
 * citation becomes the plan's), and what that changes from the version it was based on and,
 * when the plan moved on since, from the current one.
 */
import { In } from 'typeorm';
import { isPlanProposal, toPlanCitation, type PlanChangeDto } from '@/lib/contracts/corrections';
import type { PlanBody } from '@/lib/contracts/plans';
import { planDiff } from '@/lib/plans/diff';
import { AppDataSource } from '@/server/db/data-source';
import type { SignedInUser } from '@/server/auth/roles';
import { roleAtLeast } from '@/server/auth/roles';
import { Plan } from '../plans/plan.entity';
import { toPlanBody } from '../plans/plan.mapper';
import { PlanRepository, PlanRevisionRepository } from '../plans/plan.repository';
import type { Correction } from './correction.entity';

/** The plan fields of a plan proposal (`{}` for any other). */
export const proposedPlanOf = (c: Pick<Correction, 'proposed'>) => (isPlanProposal(c.proposed) ? c.proposed.plan : {});

/** What accepting writes over `before`: the proposed fields, cited to the proposal's source. */
export const proposedOver = (before: PlanBody, c: Pick<Correction, 'proposed' | 'citation'>): PlanBody => ({
  ...before,
  ...proposedPlanOf(c),
  citation: toPlanCitation(c.citation),
});

/** The plans' titles by id, for listing their proposals. */
export async function planTitles(rows: Correction[]): Promise<Map<number, string>> {
  const ids = rows.map((r) => r.planId).filter((x): x is number => x !== null);
  if (ids.length === 0) return new Map();
  const plans = await AppDataSource.getRepository(Plan).find({
    where: { id: In(ids) },
    select: { id: true, title: true },
  });
  return new Map(plans.map((p) => [p.id, p.title]));
}

/** The listing's view of the plan a proposal is about (no diffs: those come with the review). */
export const planChangeSummary = (c: Correction, title: string | undefined): PlanChangeDto => ({
  id: c.planId!,
  title: title ?? '',
  proposed: proposedPlanOf(c),
  changes: null,
  changesNow: null,
});

/** The review's part of a plan proposal; a plan turned draft since shows nothing current below editor. */
export async function planReview(c: Correction, viewer?: SignedInUser) {
  const found = await PlanRepository.findWithModel(c.planId!);
  const plan = found && (found.status === 'published' || !viewer || roleAtLeast(viewer.role, 'editor')) ? found : null;
  const base =
    c.baseVersion === null
      ? null
      : await PlanRevisionRepository.findOneBy({ planId: c.planId!, version: c.baseVersion });
  const stale = !!plan && plan.version !== c.baseVersion;
  const current = plan ? toPlanBody(plan) : null;
  const changes = base ? planDiff(base.snapshot, proposedOver(base.snapshot, c)) : null;
  return {
    plan: {
      ...planChangeSummary(c, found?.title),
      changes,
      changesNow: stale && current ? planDiff(current, proposedOver(current, c)) : null,
    },
    stale,
    currentVersion: plan?.version ?? null,
  };
}
