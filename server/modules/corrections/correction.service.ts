/**
 * Corrections from the shop floor: contributors propose (with a citation), edit or
 * withdraw while pending; editors accept (a new revision crediting the proposer) or
 * reject (with a note). Nothing is applied on top of a change the editor did not see,
 * and two editors deciding at once cannot both win.
 */
import type { EntityManager } from 'typeorm';
import type {
  AcceptBody,
  CorrectionReviewDto,
  EditProposalBody,
  ProposeBody,
  SpecProposeBody,
} from '@/lib/contracts/corrections';
import type { z } from 'zod';
import { specValueIssues } from '@/lib/contracts/curation';
import { AppDataSource } from '@/server/db/data-source';
import { writeTransaction } from '@/server/db/deadlock-retry';
import { AppError } from '@/server/errors/app-error';
import { roleAtLeast, type SignedInUser } from '@/server/auth/roles';
import { Component } from '../library/component.entity';
import { VehicleModel } from '../library/vehicle-model.entity';
import { Spec } from '../specs/spec.entity';
import { checkVisible } from '../specs/spec.service';
import { foldKey } from '../library/keys';
import { Correction, specProposalOf } from './correction.entity';
import { applyPlanChange, editPlanProposal, planTarget, planTitle } from './correction.plan';
import { toReview } from './correction.view';
import { notifyEditors, notifyProposer } from './correction.notify';
import { applyCorrection } from './correction.apply';
import { markLibraryChanged } from '../search/search.service';

const isEditor = (u: SignedInUser) => roleAtLeast(u.role, 'editor');

async function target(m: EntityManager, b: SpecProposeBody, user: SignedInUser) {
  if (b.kind === 'change') {
    const spec = await m.getRepository(Spec).findOne({ where: { id: b.specId }, relations: { component: true } });
    if (!spec) throw AppError.notFound('spec', b.specId);
    checkVisible(spec, user);
    return {
      modelId: spec.component.modelId,
      specId: spec.id,
      componentId: spec.componentId,
      parameter: spec.parameter,
      what: `${spec.component.name} — ${spec.parameter}`,
    };
  }
  if (b.kind === 'new_spec') {
    const comp = await m.getRepository(Component).findOneBy({ id: b.componentId });
    if (!comp) throw AppError.notFound('component', b.componentId);
    if (await m.getRepository(Spec).existsBy({ componentId: comp.id, parameterKey: foldKey(b.parameter) })) {
      throw AppError.conflict(`${comp.name} already has a spec for '${b.parameter}': propose a change to it instead.`);
    }
    return {
      modelId: comp.modelId,
      specId: null,
      componentId: comp.id,
      parameter: b.parameter,
      what: `${comp.name} — ${b.parameter} (new spec)`,
    };
  }
  if (!(await m.getRepository(VehicleModel).existsBy({ id: b.modelId }))) throw AppError.notFound('model', b.modelId);
  return {
    modelId: b.modelId,
    specId: null,
    componentId: null,
    parameter: b.parameter,
    what: `${b.component} — ${b.parameter} (new component)`,
  };
}

function checkAgainst(parameter: string, values: SpecProposeBody['values']) {
  const issues = specValueIssues({ parameter, ...values });
  if (issues.length)
    throw AppError.unprocessable(
      `The proposal is not valid: ${issues[0].message}.`,
      issues.map((i) => ({ path: `values.${i.path}`, message: i.message })),
    );
}

/** What a spec proposal is about, and its values checked by the editors' rules. */
async function specProposal(m: EntityManager, b: SpecProposeBody, user: SignedInUser) {
  const t = await target(m, b, user);
  checkAgainst(t.parameter, b.values);
  const proposed = {
    ...b.values,
    parameter: t.parameter,
    ...(b.kind === 'new_component' ? { component: b.component } : {}),
  };
  return { target: { ...t, planId: null }, proposed };
}

export async function propose(user: SignedInUser, b: ProposeBody): Promise<CorrectionReviewDto> {
  const saved = await writeTransaction(async (m) => {
    const { target: t, proposed } =
      b.kind === 'plan_change' ? await planTarget(m, b, user) : await specProposal(m, b, user);
    const c = await m.getRepository(Correction).save({
      kind: b.kind,
      specId: 'specId' in t ? t.specId : null,
      componentId: 'componentId' in t ? t.componentId : null,
      modelId: t.modelId,
      planId: t.planId,
      proposerId: user.id,
      proposed,
      citation: { ...b.citation, url: b.citation.url ?? null },
      rationale: b.rationale,
      status: 'pending',
      baseVersion: b.kind === 'change' || b.kind === 'plan_change' ? b.version : null,
    });
    await notifyEditors(m, c, user.displayName, t.what);
    return c;
  });
  return toReview(saved);
}

/** The proposal's subject in the proposer's e-mail: "Pickup coil — resistance", or the plan's title. */
async function whatItChanges(m: EntityManager, c: Correction): Promise<string> {
  if (c.kind === 'plan_change') return planTitle(m, c);
  const p = specProposalOf(c);
  return `${p.component ?? ''}${p.component ? ' — ' : ''}${p.parameter}`;
}

export async function findVisible(user: SignedInUser, id: number): Promise<Correction> {
  const c = await AppDataSource.getRepository(Correction).findOneBy({ id });
  if (!c || (c.proposerId !== user.id && !isEditor(user))) throw AppError.notFound('correction', id);
  return c;
}

/**
 * The proposal, locked, while it is pending (409 once decided). With `ownerId` it must be
 * that account's own: someone else's answers 404 whatever its status, so neither its
 * existence nor its decision (nor who made it) shows.
 */
async function lockPending(m: EntityManager, id: number, ownerId?: number): Promise<Correction> {
  const c = await m.getRepository(Correction).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!c || (ownerId !== undefined && c.proposerId !== ownerId)) throw AppError.notFound('correction', id);
  if (c.status !== 'pending')
    throw new AppError(
      409,
      'already_decided',
      `Correction #${id} is already ${c.status}${c.reviewerName ? ` (by ${c.reviewerName})` : ''}.`,
      { currentStatus: c.status },
    );
  return c;
}

export async function editProposal(user: SignedInUser, id: number, b: EditProposalBody): Promise<CorrectionReviewDto> {
  const saved = await writeTransaction(async (m) => {
    const c = await lockPending(m, id, user.id);
    if (c.kind === 'plan_change') await editPlanProposal(m, c, user, b);
    else if (b.plan)
      throw AppError.unprocessable('This proposal is about a spec: send values, not plan fields.', [
        { path: 'plan', message: 'Not for a spec' },
      ]);
    else if (b.values) {
      const p = specProposalOf(c);
      checkAgainst(p.parameter, b.values);
      c.proposed = { ...b.values, parameter: p.parameter, ...(p.component ? { component: p.component } : {}) };
    }
    if (b.citation) c.citation = { ...b.citation, url: b.citation.url ?? null };
    if (b.rationale) c.rationale = b.rationale;
    return m.getRepository(Correction).save(c);
  });
  return toReview(saved, user);
}

export async function withdraw(user: SignedInUser, id: number): Promise<CorrectionReviewDto> {
  const saved = await writeTransaction(async (m) => {
    const c = await lockPending(m, id, user.id);
    c.status = 'withdrawn';
    c.decidedAt = new Date();
    return m.getRepository(Correction).save(c);
  });
  return toReview(saved, user);
}

export async function decide(
  editor: SignedInUser,
  id: number,
  decision: { accept: true; body: z.infer<typeof AcceptBody> } | { accept: false; note: string },
): Promise<CorrectionReviewDto> {
  const saved = await writeTransaction(async (m) => {
    const c = await lockPending(m, id);
    const confirmStale = decision.accept && decision.body.confirmStale === true;
    if (decision.accept && c.kind === 'plan_change') await applyPlanChange(m, c, editor, confirmStale);
    else if (decision.accept) c.specId = await applyCorrection(m, c, editor, confirmStale);
    Object.assign(c, {
      status: decision.accept ? 'accepted' : 'rejected',
      reviewerId: editor.id,
      reviewerName: editor.displayName,
      decisionNote: decision.accept ? (decision.body.note ?? null) : decision.note,
      decidedAt: new Date(),
    });
    await m.getRepository(Correction).save(c);
    await notifyProposer(m, c, await whatItChanges(m, c));
    return c;
  });
  if (decision.accept && saved.kind !== 'plan_change') markLibraryChanged();
  return toReview(saved);
}
