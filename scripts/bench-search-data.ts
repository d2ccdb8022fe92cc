/**
 * The search benchmark's database: the invented library of bench-library.ts loaded into
 * the real schema (makes, models, components, specs) with multi-row INSERTs, and, for the
 * anchor, the same text in a bare table with an InnoDB FULLTEXT index. Built once and kept:
 * a later run reuses it while its size and generator version match (bench_meta).
 */
import { performance } from 'node:perf_hooks';
import { AppDataSource } from '@/server/db/data-source';
import { ensureDatabase } from '@/server/db/ensure-database';
import { foldKey, makeKey, modelKey } from '@/server/modules/library/keys';
import { withSynonyms } from '@/lib/specs/synonyms';
import { MAKES, SPECS_PER_MODEL, docAt, modelAt } from './bench-library';

const VERSION = 'bench-library v1';
const CHUNK = 2000;

async function insertRows(table: string, columns: string[], rows: unknown[][]) {
  for (let i = 0; i < rows.length; i += CHUNK)
    await AppDataSource.query(`INSERT INTO ${table} (${columns.join(', ')}) VALUES ?`, [rows.slice(i, i + CHUNK)]);
}

async function isBuilt(specs: number): Promise<boolean> {
  await AppDataSource.query('CREATE TABLE IF NOT EXISTS bench_meta (k varchar(40) PRIMARY KEY, v varchar(200))');
  const [row] = await AppDataSource.query("SELECT v FROM bench_meta WHERE k = 'library'");
  return row?.v === `${VERSION} · ${specs}`;
}

async function clear() {
  await AppDataSource.query("DELETE FROM bench_meta WHERE k = 'library'");
  for (const t of ['library_changes', 'spec_revisions', 'specs', 'components', 'vehicle_models', 'makes', 'sources'])
    await AppDataSource.query(`DELETE FROM ${t}`);
  await AppDataSource.query('DROP TABLE IF EXISTS bench_fulltext');
  await AppDataSource.query('CREATE TABLE bench_fulltext (id int PRIMARY KEY, body text NOT NULL) ENGINE=InnoDB');
}

/** The text MariaDB's full-text anchor searches: the same fields (and synonyms) our index has. */
const fulltextBody = (d: ReturnType<typeof docAt>) =>
  `${d.make} ${d.name} ${d.variant} ${d.yearFrom} ${d.yearTo ?? ''} ${d.component} ${d.parameter} ${withSynonyms(`${d.component} ${d.parameter}`)}`;

/** Loads `specs` invented specs unless the database already holds exactly them; returns the seconds spent. */
export async function ensureBenchLibrary(db: string, specs: number): Promise<number | null> {
  await ensureDatabase(db);
  if (!AppDataSource.isInitialized) await AppDataSource.initialize();
  await AppDataSource.runMigrations({ transaction: 'each' });
  if (await isBuilt(specs)) return null;
  const t = performance.now();
  await clear();
  await insertRows(
    'makes',
    ['id', 'name', 'name_key'],
    MAKES.map((m, i) => [i + 1, m, makeKey(m)]),
  );
  await insertRows(
    'sources',
    ['id', 'title', 'edition', 'source_key'],
    [[1, 'Invented Workshop Manual', '1st', 'invented workshop manual|1st']],
  );
  const models = Math.ceil(specs / SPECS_PER_MODEL);
  let componentId = 0;
  for (let first = 0; first < models; first += 1000) {
    const modelRows: unknown[][] = [];
    const componentRows: unknown[][] = [];
    const specRows: unknown[][] = [];
    const textRows: unknown[][] = [];
    for (let mi = first; mi < Math.min(models, first + 1000); mi += 1) {
      const m = modelAt(mi);
      modelRows.push([
        mi + 1,
        MAKES.indexOf(m.make) + 1,
        m.name,
        m.yearFrom,
        m.yearTo,
        m.variant,
        modelKey({ ...m, model: m.name }),
      ]);
      const components = new Map<string, number>();
      for (let i = mi * SPECS_PER_MODEL + 1; i <= Math.min(specs, (mi + 1) * SPECS_PER_MODEL); i += 1) {
        const d = docAt(i);
        let cid = components.get(d.component);
        if (cid === undefined) {
          components.set(d.component, (cid = ++componentId));
          componentRows.push([cid, mi + 1, d.component, foldKey(d.component)]);
        }
        specRows.push([
          i,
          cid,
          d.parameter,
          foldKey(d.parameter),
          d.kind,
          d.min,
          d.nominal,
          d.max,
          d.unit,
          1,
          'published',
          1,
        ]);
        textRows.push([i, fulltextBody(d)]);
      }
    }
    await insertRows(
      'vehicle_models',
      ['id', 'make_id', 'name', 'year_from', 'year_to', 'variant', 'model_key'],
      modelRows,
    );
    await insertRows('components', ['id', 'model_id', 'name', 'name_key'], componentRows);
    await insertRows(
      'specs',
      [
        'id',
        'component_id',
        'parameter',
        'parameter_key',
        'quantity_kind',
        'min_value',
        'nominal_value',
        'max_value',
        'unit',
        'source_id',
        'status',
        'version',
      ],
      specRows,
    );
    await insertRows('bench_fulltext', ['id', 'body'], textRows);
  }
  await AppDataSource.query('ALTER TABLE bench_fulltext ADD FULLTEXT INDEX ft_body (body)');
  await AppDataSource.query("REPLACE INTO bench_meta (k, v) VALUES ('library', ?)", [`${VERSION} · ${specs}`]);
  return (performance.now() - t) / 1000;
}
