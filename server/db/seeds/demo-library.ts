/**
 * Loads the demo library (data/*.csv, in the import format) through the same importer
 * editors use, then the demo test plans and connector faces (data/demo-plans.json) through
 * the plan file import. Running it again changes nothing: specs, plans and connectors already
 * in the library (perhaps edited since) are left alone; only missing ones are created.
 */
import fs from 'node:fs';
import path from 'node:path';
import { config } from '@/server/config';
import { PlanFile } from '@/lib/contracts/plans';
import { importCsvNow, type ImportSummary } from '@/server/modules/imports/import.service';
import { importPlanFile } from '@/server/modules/plans/plan-file.service';

export const DEMO_FILES = ['demo-library.csv', 'demo-plan-parts.csv'];
/** The demo test plans and connector faces, in the plan file format (lib/contracts/plans.ts PlanFile). */
export const DEMO_PLAN_FILE = 'demo-plans.json';
export const DEMO_ACTOR = { id: null, name: 'Specbench demo loader' };

export async function loadDemoLibrary(dataDir = path.join(config.rootDir, 'data')): Promise<ImportSummary[]> {
  const summaries: ImportSummary[] = [];
  for (const file of DEMO_FILES) {
    const text = fs.readFileSync(path.join(dataDir, file), 'utf8');
    summaries.push(
      await importCsvNow(text, file, DEMO_ACTOR, 'Demo library (invented makes, models and sources)', {
        createOnly: true,
      }),
    );
  }
  const planFile = PlanFile.parse(JSON.parse(fs.readFileSync(path.join(dataDir, DEMO_PLAN_FILE), 'utf8')));
  await importPlanFile(planFile, DEMO_ACTOR, { createOnly: true });
  return summaries;
}
