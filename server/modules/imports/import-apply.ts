/**
 * Committing an import plan: one transaction creates the missing makes, models,
 * components and sources, writes every created or updated spec, and appends one
 * revision per changed spec. A spec edited since the plan was made aborts the whole
 * commit with 409, so nothing is applied on top of a change nobody saw.
 */
import type { EntityManager } from 'typeorm';
import { In } from 'typeorm';
import type { SpecCsvRow } from '../../../lib/csv';
import { unitKind, type CanonicalUnit } from '../../../lib/units';
import { AppError } from '../../errors/app-error';
import { Make } from '../library/make.entity';
import { VehicleModel } from '../library/vehicle-model.entity';
import { Component } from '../library/component.entity';
import { Source } from '../library/source.entity';
import { Spec } from '../specs/spec.entity';
import { SpecRevision } from '../specs/spec-revision.entity';
import { foldKey, makeKey, modelKey, sourceKey } from '../library/keys';
import type { PlannedRow } from './import-plan';

export type { Actor } from "../../auth/actor";
import type { Actor } from "../../auth/actor";
const CHUNK = 500;

async function chunked<T>(items: T[], fn: (chunk: T[]) => Promise<unknown>) {
  for (let i = 0; i < items.length; i += CHUNK) await fn(items.slice(i, i + CHUNK));
}

/** Finds or inserts rows by natural key; returns key → id. */
async function ensure<E extends { id: number }>(
  m: EntityManager, entity: new () => E, keyColumn: keyof E & string,
  wanted: Map<string, Partial<E>>,
): Promise<Map<string, number>> {
  const ids = new Map<string, number>();
  const keys = [...wanted.keys()];
  await chunked(keys, async (chunk) => {
    const found = await m.getRepository(entity).find({ where: { [keyColumn]: In(chunk) } as never });
    for (const e of found) ids.set(e[keyColumn] as unknown as string, e.id);
  });
  const missing = keys.filter((k) => !ids.has(k)).map((k) => wanted.get(k)!);
  await chunked(missing, async (chunk) => {
    const result = await m.getRepository(entity).insert(chunk as never);
    chunk.forEach((e, i) => ids.set(e[keyColumn] as unknown as string, result.identifiers[i].id));
  });
  return ids;
}

async function ensureLibrary(m: EntityManager, rows: SpecCsvRow[]) {
  const makes = new Map(rows.map((r) => [makeKey(r.make), { name: r.make.trim(), nameKey: makeKey(r.make) }]));
  const makeIds = await ensure(m, Make, 'nameKey', makes);
  const models = new Map(rows.map((r) => [modelKey(r), {
    makeId: makeIds.get(makeKey(r.make)), name: r.model.trim(), yearFrom: r.yearFrom, yearTo: r.yearTo,
    variant: r.variant.trim(), modelKey: modelKey(r),
  }]));
  const modelIds = await ensure(m, VehicleModel, 'modelKey', models);
  const sources = new Map(rows.map((r) => [sourceKey({ title: r.sourceTitle, edition: r.sourceEdition }), {
    title: r.sourceTitle.trim(), edition: r.sourceEdition.trim(), url: r.sourceUrl, kind: 'service_manual' as const,
    sourceKey: sourceKey({ title: r.sourceTitle, edition: r.sourceEdition }),
  }]));
  const sourceIds = await ensure(m, Source, 'sourceKey', sources);
  const componentKey = (r: SpecCsvRow) => `${modelIds.get(modelKey(r))}|${foldKey(r.component)}`;
  const components = new Map(rows.map((r) => [componentKey(r), {
    modelId: modelIds.get(modelKey(r)), name: r.component.trim(), nameKey: foldKey(r.component), compositeKey: componentKey(r),
  }]));
  const componentIds = await ensureComponents(m, components);
  return {
    componentId: (r: SpecCsvRow) => componentIds.get(componentKey(r))!,
    sourceId: (r: SpecCsvRow) => sourceIds.get(sourceKey({ title: r.sourceTitle, edition: r.sourceEdition }))!,
  };
}

/** Components are keyed by (model, name), which ensure() cannot express as one column. */
async function ensureComponents(m: EntityManager, wanted: Map<string, { modelId?: number; name: string; nameKey: string }>) {
  const ids = new Map<string, number>();
  const modelIds = [...new Set([...wanted.values()].map((c) => c.modelId!))];
  await chunked(modelIds, async (chunk) => {
    for (const c of await m.getRepository(Component).find({ where: { modelId: In(chunk) } })) ids.set(`${c.modelId}|${c.nameKey}`, c.id);
  });
  const missing = [...wanted.entries()].filter(([k]) => !ids.has(k));
  await chunked(missing, async (chunk) => {
    const result = await m.getRepository(Component).insert(chunk.map(([, c]) => ({ modelId: c.modelId, name: c.name, nameKey: c.nameKey })));
    chunk.forEach(([k], i) => ids.set(k, result.identifiers[i].id));
  });
  return ids;
}

function specValues(row: SpecCsvRow, sourceId: number) {
  return {
    parameter: row.parameter.trim(), parameterKey: foldKey(row.parameter), quantityKind: unitKind(row.unit as CanonicalUnit),
    min: row.min, nominal: row.nominal, max: row.max, unit: row.unit, refTempC: row.refTempC, material: row.material,
    testPoints: row.testPoints || null, conditions: row.conditions || null, notes: row.notes || null,
    sourceId, sourcePage: row.sourcePage || null,
  };
}

function snapshotOf(row: SpecCsvRow, sourceId: number) {
  const v = specValues(row, sourceId);
  return {
    parameter: v.parameter, min: v.min, nominal: v.nominal, max: v.max, unit: v.unit, refTempC: v.refTempC,
    material: v.material, testPoints: v.testPoints, conditions: v.conditions, notes: v.notes, sourceId,
    sourceTitle: row.sourceTitle.trim(), sourceEdition: row.sourceEdition.trim(), sourcePage: v.sourcePage,
    status: 'published' as const,
  };
}

export async function applyImport(
  m: EntityManager, plan: PlannedRow[], actor: Actor, meta: { batchId: number; reason: string },
): Promise<{ created: number; updated: number }> {
  const changed = plan.filter((p) => p.action !== 'unchanged');
  if (changed.length === 0) return { created: 0, updated: 0 };
  const lib = await ensureLibrary(m, changed.map((p) => p.row));
  const revisions: Partial<SpecRevision>[] = [];
  const revision = (p: PlannedRow, specId: number, version: number, fields: string[]) => revisions.push({
    specId, version, snapshot: snapshotOf(p.row, lib.sourceId(p.row)), changedFields: fields,
    authorId: actor.id, authorName: actor.name, reason: meta.reason, origin: 'import', originRef: `batch #${meta.batchId}`,
  });

  const creates = changed.filter((p) => p.action === 'create');
  await chunked(creates, async (chunk) => {
    const result = await m.getRepository(Spec).insert(chunk.map((p) => ({ ...specValues(p.row, lib.sourceId(p.row)), componentId: lib.componentId(p.row), version: 1 })));
    chunk.forEach((p, i) => revision(p, result.identifiers[i].id, 1, ['created']));
  });
  for (const p of changed.filter((c) => c.action === 'update')) {
    const result = await m.createQueryBuilder().update(Spec)
      .set({ ...specValues(p.row, lib.sourceId(p.row)), version: () => 'version + 1' })
      .where('id = :id AND version = :version', { id: p.specId, version: p.baseVersion })
      .execute();
    if (result.affected !== 1) {
      throw AppError.conflict(`The spec on line ${p.line} was changed by someone else after this import was previewed. Preview the file again.`, { line: p.line, specId: p.specId });
    }
    revision(p, p.specId!, p.baseVersion! + 1, p.changes.map((c) => c.field));
  }
  await chunked(revisions, (chunk) => m.getRepository(SpecRevision).insert(chunk));
  return { created: creates.length, updated: changed.length - creates.length };
}
