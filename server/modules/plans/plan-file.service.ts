/**
 * The plan file (lib/contracts/plans.ts PlanFile, documented in DEVELOPERS.md): import in
 * one transaction — a plan is matched by title and model; new ones are created, changed ones
 * get a new version, identical ones are left alone — and export of the library's plans.
 * A problem is located by its JSON path in the file ('plans.0.steps.3.next.fail.step').
 */
import { PLAN_FILE_FORMAT, type PlanBody, type PlanFile } from '@/lib/contracts/plans';
import type { Actor } from '@/server/auth/actor';
import { AppDataSource } from '@/server/db/data-source';
import { In } from 'typeorm';
import { findComponent } from '@/lib/plans/applicability';
import { AppError } from '@/server/errors/app-error';
import { Component } from '../library/component.entity';
import { foldKey } from '../library/keys';
import { markLibraryChanged } from '../library/library-changes';
import { ComponentConnector } from './component-connector.entity';
import { setConnectorIn } from './connector.service';
import { toPlanBody, toPlanSummary } from './plan.mapper';
import { modelParts, PlanRepository } from './plan.repository';
import { createPlanIn, resolveModelId, updatePlanIn } from './plan.service';

export type PlanImportResult = {
  created: number;
  updated: number;
  unchanged: number;
  connectors: number;
  plans: ReturnType<typeof toPlanSummary>[];
};

const sameContent = (a: PlanBody, b: PlanBody) => {
  const strip = ({ model: _m, modelId: _id, ...rest }: PlanBody) => JSON.stringify(rest);
  return strip(a) === strip(b);
};

export async function importPlanFile(
  file: PlanFile,
  actor: Actor,
  options: { createOnly?: boolean } = {},
): Promise<PlanImportResult> {
  const imported = await AppDataSource.transaction(async (m) => {
    const result: PlanImportResult = { created: 0, updated: 0, unchanged: 0, connectors: 0, plans: [] };
    for (const [i, body] of file.plans.entries()) {
      const prefix = `plans.${i}.`;
      const modelId = await resolveModelId(body, m, prefix);
      const all = await m.withRepository(PlanRepository).listWithModels();
      const existing = all.find((p) => p.modelId === modelId && foldKey(p.title) === foldKey(body.title));
      if (!existing) {
        const plan = await createPlanIn(m, body, actor, 'Imported from a plan file', prefix);
        result.created += 1;
        result.plans.push(toPlanSummary(plan));
      } else if (options.createOnly || sameContent(toPlanBody(existing), body)) {
        result.unchanged += 1;
      } else {
        const reason = 'Imported from a plan file';
        const updated = await updatePlanIn(
          m,
          existing.id,
          { ...body, version: existing.version, reason },
          actor,
          prefix,
        );
        result.updated += 1;
        result.plans.push(toPlanSummary(updated));
      }
    }
    for (const [i, c] of file.connectors.entries()) {
      const modelId = await resolveModelId({ model: c.model, modelId: null }, m, `connectors.${i}.`);
      const component = findComponent(c.component, await modelParts(modelId!, m));
      if (!component)
        throw AppError.unprocessable(`The model has no component "${c.component}".`, [
          { path: `connectors.${i}.component`, message: 'No such component on this model' },
        ]);
      if (options.createOnly && (await m.existsBy(ComponentConnector, { componentId: component.id }))) continue;
      await setConnectorIn(m, component.id, c.connector);
      result.connectors += 1;
    }
    return result;
  });
  // The runs' cached parts carry the connector faces (run-step.ts).
  if (imported.connectors > 0) markLibraryChanged();
  return imported;
}

export async function exportPlanFile(): Promise<PlanFile> {
  const plans = await PlanRepository.listWithModels();
  const rows = await AppDataSource.getRepository(ComponentConnector).find();
  const components = await AppDataSource.getRepository(Component).find({
    where: { id: In(rows.map((r) => r.componentId)) },
    relations: { model: { make: true } },
  });
  const connectors = rows.flatMap((r) => {
    const c = components.find((x) => x.id === r.componentId);
    if (!c) return [];
    const model = { make: c.model.make.name, name: c.model.name, yearFrom: c.model.yearFrom, variant: c.model.variant };
    return [{ model, component: c.name, connector: r.connector }];
  });
  return { format: PLAN_FILE_FORMAT, plans: plans.map(toPlanBody), connectors };
}
