/**
 * The template editors download: the example rows of data/spec-template.csv written out
 * again in the current import format, so its header is always the field list's columns
 * (a column added to lib/contracts/spec-fields.ts appears here without editing the file).
 */
import fs from 'node:fs';
import path from 'node:path';
import { decodeCsv, toSpecCsv, validateSpecCsv } from '@/lib/csv';
import { config } from '@/server/config';

let cached: string | null = null;

export function templateCsv(): string {
  if (cached === null) {
    const file = fs.readFileSync(path.join(config.rootDir, 'data', 'spec-template.csv'));
    const { accepted, rejected, fileErrors } = validateSpecCsv(decodeCsv(new Uint8Array(file)));
    if (fileErrors.length || rejected.length) throw new Error('data/spec-template.csv no longer imports');
    cached = toSpecCsv(accepted.map((a) => a.row));
  }
  return cached;
}
