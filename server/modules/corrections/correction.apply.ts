/**
 * Accepting a correction writes through the editors' one write path (spec-write.ts):
 * a changed spec gets a new revision, a proposed spec or component is created, and
 * the revision's origin is 'correction', credited to the proposer.
 */
import type { EntityManager } from 'typeorm';
import type { CreateSpecBody } from '@/lib/contracts/curation';
import { REVIEWED_FIELDS, fieldsWith, type SpecValues } from '@/lib/contracts/spec-fields';
import type { Material } from '@/lib/contracts/enums';
import { pickValues } from '@/lib/contracts/spec-snapshot';
import { AppError } from '@/server/errors/app-error';
import type { SignedInUser } from '@/server/auth/roles';
import { VehicleModel } from '../library/vehicle-model.entity';
import { Component } from '../library/component.entity';
import { Spec } from '../specs/spec.entity';
import { ensureSource } from '../specs/spec-library';
import { checkValues, lockSpec, writeSpecChange } from '../specs/spec-write';
import { insertNewSpec } from '../specs/spec-edit.service';
import { User } from '../users/user.entity';
import { specProposalOf, type Correction } from './correction.entity';
import { toReview } from './correction.view';

/** The proposer as the author of the accepted change (the editor named beside it), and the revision's reason. */
/** Accepting over a later version than the proposal's needs the editor's word that they compared (409 otherwise). */
export async function assertNotStale(
  c: Correction,
  current: { version: number },
  confirmStale: boolean,
  what: string,
  compare: string,
) {
  if (current.version === c.baseVersion || confirmStale) return;
  throw new AppError(
    409,
    'stale_proposal',
    `The ${what} changed after this proposal was made (version ${c.baseVersion} → ${current.version}). ${compare} and accept again with confirmStale: true.`,
    { review: await toReview(c) },
  );
}

export async function credit(m: EntityManager, c: Correction, editor: SignedInUser) {
  const proposer = await m.getRepository(User).findOneByOrFail({ id: c.proposerId });
  return {
    actor: { id: proposer.id, name: `${proposer.displayName} (accepted by ${editor.displayName})`.slice(0, 120) },
    reason: `Correction #${c.id}: ${c.rationale}`.slice(0, 500),
    originRef: `correction #${c.id}`,
  };
}

/** The reviewed fields of the list, as the proposal sets them (empty text is null; no material: the spec's, or from the parameter). */
function proposedValues(c: Correction, spec: Spec | null) {
  const p = specProposalOf(c);
  const out: Record<string, unknown> = {};
  for (const f of fieldsWith('reviewed')) {
    const v = p[f.key as keyof typeof p];
    if (f.key === 'material') out.material = v ?? spec?.material;
    else if (v === undefined) out[f.key] = spec ? spec[f.key] : null;
    else out[f.key] = f.kind === 'text' && spec ? v || null : v;
  }
  return out as Pick<SpecValues, Exclude<(typeof REVIEWED_FIELDS)[number], 'material'>> & { material: Material };
}

async function applyChange(
  m: EntityManager,
  c: Correction,
  editor: SignedInUser,
  confirmStale: boolean,
): Promise<number> {
  const current = await m
    .getRepository(Spec)
    .findOne({ where: { id: c.specId! }, lock: { mode: 'pessimistic_write' } });
  if (!current) throw AppError.notFound('spec', c.specId!);
  await assertNotStale(c, current, confirmStale, 'spec', 'Compare the three');
  const { spec, source } = await lockSpec(m, current.id, current.version);
  const values: SpecValues = {
    ...pickValues(spec),
    ...proposedValues(c, spec),
    sourceId: await ensureSource(m, { ...c.citation }),
    sourcePage: c.citation.page,
  };
  checkValues(values);
  const { actor, reason, originRef } = await credit(m, c, editor);
  await writeSpecChange(m, spec, source, { values, actor, reason, origin: 'correction', originRef });
  return spec.id;
}

async function applyNew(m: EntityManager, c: Correction, editor: SignedInUser): Promise<number> {
  const model = await m
    .getRepository(VehicleModel)
    .findOneOrFail({ where: { id: c.modelId! }, relations: { make: true } });
  const p = specProposalOf(c);
  const component = c.componentId
    ? (await m.getRepository(Component).findOneByOrFail({ id: c.componentId })).name
    : p.component!;
  const { actor, reason, originRef } = await credit(m, c, editor);
  const body: CreateSpecBody = {
    make: model.make.name,
    model: model.name,
    yearFrom: model.yearFrom,
    yearTo: model.yearTo,
    variant: model.variant,
    component,
    parameter: p.parameter,
    ...proposedValues(c, null),
    notes: '',
    status: 'published',
    reason,
    source: { title: c.citation.title, edition: c.citation.edition, page: c.citation.page, url: c.citation.url },
  };
  return insertNewSpec(m, body, actor, { origin: 'correction', originRef });
}

/** Applies the correction inside the caller's transaction; returns the spec it wrote. */
export function applyCorrection(
  m: EntityManager,
  c: Correction,
  editor: SignedInUser,
  confirmStale: boolean,
): Promise<number> {
  return c.kind === 'change' ? applyChange(m, c, editor, confirmStale) : applyNew(m, c, editor);
}
