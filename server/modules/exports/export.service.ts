/**
 * Export of the published library in the import format (lib/csv toSpecCsv: RFC 4180, CRLF,
 * formula-like text neutralised), produced in chunks of 1000 specs so memory stays flat
 * however large the library. Exported and imported again, every row comes back "unchanged".
 */
import type { ExportQuery } from '@/lib/contracts/imports';
import { toSpecCsv, type SpecCsvRow } from '@/lib/csv';
import { hasFlag } from '@/lib/contracts/spec-fields';
import { CSV_FIELDS } from '@/lib/csv/columns';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import { foldKey } from '../library/keys';

const CHUNK = 1000;
/** Spreadsheets read a UTF-8 file as a legacy code page unless it starts with a BOM (Ω, °C); the importer accepts it. */
const BOM = '\uFEFF';

type Filter = { where: string; params: unknown[]; label: string };

async function resolveFilter(query: ExportQuery): Promise<Filter> {
  if (query.modelId) {
    const [model] = await AppDataSource.query('SELECT id, name FROM vehicle_models WHERE id = ?', [query.modelId]);
    if (!model) throw AppError.notFound('model', query.modelId);
    return { where: 'AND vm.id = ?', params: [model.id], label: `-model-${model.id}` };
  }
  if (query.make) {
    const [make] = await AppDataSource.query('SELECT id, name FROM makes WHERE name_key = ?', [foldKey(query.make)]);
    if (!make) throw new AppError(404, 'not_found', `No make named "${query.make}".`);
    return { where: 'AND mk.id = ?', params: [make.id], label: `-${foldKey(make.name).replace(/[^a-z0-9]+/g, '-')}` };
  }
  return { where: '', params: [], label: '' };
}

const FROM = `FROM specs s JOIN components c ON c.id = s.component_id
  JOIN vehicle_models vm ON vm.id = c.model_id JOIN makes mk ON mk.id = vm.make_id
  LEFT JOIN sources src ON src.id = s.source_id`;

async function orderedIds(filter: Filter): Promise<number[]> {
  const rows: { id: number }[] = await AppDataSource.query(
    `SELECT s.id ${FROM} WHERE s.status = 'published' ${filter.where}
      ORDER BY mk.name, vm.name, vm.year_from, vm.variant, c.name, s.parameter, s.id`,
    filter.params,
  );
  return rows.map((r) => r.id);
}

/** A CSV field's value as selected: text cells as '' when empty, as the import format writes them. */
function selected(f: (typeof CSV_FIELDS)[number]): string {
  const column = f.column ? `s.${f.column}` : `src.${f.sourceColumn}`;
  const asText = f.kind === 'text' && !hasFlag(f, 'required') && !hasFlag(f, 'csvEmptyIsNull');
  return `${asText ? `COALESCE(${column}, '')` : column} AS ${f.key}`;
}
const VALUES = CSV_FIELDS.map(selected).join(', ');

async function rowsFor(ids: number[]): Promise<SpecCsvRow[]> {
  const rows: (SpecCsvRow & { id: number })[] = await AppDataSource.query(
    `SELECT s.id, mk.name AS make, vm.name AS model, vm.year_from AS yearFrom, vm.year_to AS yearTo, vm.variant,
            c.name AS component, ${VALUES}
       ${FROM} WHERE s.id IN (?)`,
    [ids],
  );
  const byId = new Map(rows.map(({ id, ...row }) => [id, row]));
  return ids.map((id) => byId.get(id)).filter((r): r is SpecCsvRow => r !== undefined);
}

export type CsvDownload = { fileName: string; chunks: AsyncGenerator<string> };

async function* csvChunks(ids: number[]): AsyncGenerator<string> {
  yield BOM + toSpecCsv([]);
  for (let i = 0; i < ids.length; i += CHUNK) {
    const csv = toSpecCsv(await rowsFor(ids.slice(i, i + CHUNK)));
    yield csv.slice(csv.indexOf('\r\n') + 2); // toSpecCsv always begins with the header line
  }
}

/** Resolves the filter first, so an unknown make or model is a 404 before the first byte. */
export async function openSpecsExport(query: ExportQuery): Promise<CsvDownload> {
  const filter = await resolveFilter(query);
  return { fileName: `specbench-specs${filter.label}.csv`, chunks: csvChunks(await orderedIds(filter)) };
}
