/** Corrections → DTOs: names, the proposer's record, and the three-way field view for review. */
import { In } from 'typeorm';
import type { CorrectionDto, CorrectionReviewDto } from '@/lib/contracts/corrections';
import { REVIEWED_FIELDS, SPEC_FIELDS, hasFlag } from '@/lib/contracts/spec-fields';
import { citationText } from '@/lib/format/citation';
import { modelTitle } from '@/lib/format/model-title';
import { AppDataSource } from '@/server/db/data-source';
import { Component } from '../library/component.entity';
import { VehicleModel } from '../library/vehicle-model.entity';
import { Spec } from '../specs/spec.entity';
import { SpecRevision } from '../specs/spec-revision.entity';
import { Source } from '../library/source.entity';
import { User } from '../users/user.entity';
import { seesDrafts } from '../specs/spec.service';
import type { SignedInUser } from '@/server/auth/roles';
import { specProposalOf, type Correction } from './correction.entity';
import { planChangeSummary, planReview, planTitles } from './correction.plan-view';

/** The fields a review compares, then the citation as one 'source' line. */
export const COMPARED = [...REVIEWED_FIELDS, 'source'] as const;
type Compared = (typeof COMPARED)[number];
type Values = Record<Compared, unknown>;

/** The reviewed values of a spec (or a snapshot of one), text fields as '' when empty, and its citation. */
function reviewValues(v: Partial<Record<(typeof REVIEWED_FIELDS)[number], unknown>>, source: string | null): Values {
  const out = { source } as Values;
  for (const f of SPEC_FIELDS) {
    if (!hasFlag(f, 'reviewed')) continue;
    const value = v[f.key as (typeof REVIEWED_FIELDS)[number]];
    out[f.key as Compared] = f.kind === 'text' ? (value ?? '') : value;
  }
  return out;
}

export async function toDtos(rows: Correction[]): Promise<CorrectionDto[]> {
  if (rows.length === 0) return [];
  const repo = <T extends object>(e: new () => T) => AppDataSource.getRepository(e);
  const models = await repo(VehicleModel).find({
    where: { id: In([...new Set(rows.map((r) => r.modelId).filter((x): x is number => x !== null))].concat(0)) },
    relations: { make: true },
  });
  const specs = await repo(Spec).find({
    where: {
      id: In(
        rows
          .map((r) => r.specId)
          .filter((x): x is number => x !== null)
          .concat(0),
      ),
    },
    relations: { component: true },
  });
  const comps = await repo(Component).find({
    where: {
      id: In(
        rows
          .map((r) => r.componentId)
          .filter((x): x is number => x !== null)
          .concat(0),
      ),
    },
  });
  const proposerIds = [...new Set(rows.map((r) => r.proposerId))];
  const users = await repo(User).find({ where: { id: In(proposerIds) } });
  const records: { proposerId: number; status: string; n: string }[] = await AppDataSource.query(
    `SELECT proposer_id AS proposerId, status, COUNT(*) AS n FROM corrections WHERE proposer_id IN (?) AND status IN ('accepted','rejected') GROUP BY proposer_id, status`,
    [proposerIds],
  );
  const planTitleOf = await planTitles(rows);
  const count = (id: number, status: string) =>
    Number(records.find((r) => Number(r.proposerId) === id && r.status === status)?.n ?? 0);
  return rows.map((r): CorrectionDto => {
    const spec = specs.find((s) => s.id === r.specId);
    const model = models.find((m) => m.id === r.modelId);
    const common = {
      id: r.id,
      status: r.status,
      specId: r.specId,
      componentId: r.componentId,
      citation: r.citation,
      rationale: r.rationale,
      baseVersion: r.baseVersion,
      proposer: {
        id: r.proposerId,
        name: users.find((u) => u.id === r.proposerId)?.displayName ?? 'unknown',
        accepted: count(r.proposerId, 'accepted'),
        rejected: count(r.proposerId, 'rejected'),
      },
      reviewerName: r.reviewerName,
      decisionNote: r.decisionNote,
      decidedAt: r.decidedAt?.toISOString() ?? null,
      createdAt: r.createdAt.toISOString(),
      updatedAt: r.updatedAt.toISOString(),
    };
    if (r.kind === 'plan_change')
      return {
        ...common,
        kind: r.kind,
        modelId: r.modelId,
        modelTitle: model ? modelTitle(model) : null,
        componentName: '',
        parameter: '',
        proposed: null,
        plan: planChangeSummary(r, planTitleOf.get(r.planId!)),
      };
    const p = specProposalOf(r);
    return {
      ...common,
      kind: r.kind,
      modelId: r.modelId!,
      modelTitle: model ? modelTitle(model) : '',
      componentName: spec?.component.name ?? comps.find((c) => c.id === r.componentId)?.name ?? p.component ?? '',
      parameter: spec?.parameter ?? p.parameter ?? '',
      proposed: p,
      plan: null,
    };
  });
}

async function valuesOfSpec(spec: Spec): Promise<Values> {
  const source = spec.sourceId ? await AppDataSource.getRepository(Source).findOneBy({ id: spec.sourceId }) : null;
  return reviewValues(spec, source ? citationText(source, spec.sourcePage) : null);
}

/** The spec's values at the version the proposal was made against, from its revision snapshot. */
async function valuesAt(specId: number, version: number | null): Promise<Values | null> {
  if (version === null) return null;
  const rev = await AppDataSource.getRepository(SpecRevision).findOneBy({ specId, version });
  if (!rev) return null;
  const s = rev.snapshot;
  return reviewValues(
    s,
    s.sourceTitle ? citationText({ title: s.sourceTitle, edition: s.sourceEdition }, s.sourcePage) : null,
  );
}

/** The proposal with the three-way view; a spec turned draft since shows no current values below editor. */
export async function toReview(r: Correction, viewer?: SignedInUser): Promise<CorrectionReviewDto> {
  const [dto] = await toDtos([r]);
  if (dto.kind === 'plan_change') {
    const { plan, stale, currentVersion } = await planReview(r, viewer);
    return { ...dto, plan, stale, currentVersion, fields: [] };
  }
  const found =
    r.specId && r.kind === 'change' ? await AppDataSource.getRepository(Spec).findOneBy({ id: r.specId }) : null;
  const spec = found && (found.status === 'published' || !viewer || seesDrafts(viewer)) ? found : null;
  const current = spec ? await valuesOfSpec(spec) : null;
  const before = spec ? await valuesAt(spec.id, r.baseVersion) : null;
  const p = dto.proposed;
  const proposed = reviewValues(
    { ...p, material: p.material ?? current?.material ?? null },
    citationText(r.citation, r.citation.page),
  );
  return {
    ...dto,
    stale: !!spec && spec.version !== r.baseVersion,
    currentVersion: spec?.version ?? null,
    fields: COMPARED.map((field) => ({
      field,
      proposedAgainst: before?.[field] ?? null,
      current: current?.[field] ?? null,
      proposed: proposed[field] ?? null,
    })),
  };
}
