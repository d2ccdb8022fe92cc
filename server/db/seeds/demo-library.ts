/**
 * Loads the demo library (data/*.csv, in the import format) through the same importer
 * editors use. Running it again changes nothing: specs already in the library (perhaps
 * edited since) are left alone; only missing ones are created.
 */
import fs from 'node:fs';
import path from 'node:path';
import { config } from '@/server/config';
import { importCsvNow, type ImportSummary } from '@/server/modules/imports/import.service';

export const DEMO_FILES = ['demo-library.csv'];
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
  return summaries;
}
