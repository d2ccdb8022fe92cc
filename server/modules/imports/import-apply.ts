/**
 * Committing a staged import (import_batch_rows) inside the caller's transaction, set-based
 * in MariaDB: a fixed handful of INSERT … SELECT / UPDATE … JOIN statements whatever the
 * size of the file, so the commit keeps pace with a bulk load and Node's memory stays flat.
 * It creates the missing makes, models, components and sources (found by natural key,
 * each looked up once through the batch's own numbering, see import-stage.ts), writes every
 * created or updated spec, and appends one revision per changed spec. A spec changed (or
 * created) by someone else since the preview aborts the whole commit with 409, so nothing
 * is applied on top of a change nobody saw.
 */
import type { EntityManager } from 'typeorm';
import { AppError } from '@/server/errors/app-error';
import type { Actor } from '@/server/auth/actor';
import { COLUMN_FIELDS } from '@/lib/contracts/spec-fields';
import { FIRST, STAGED_SPEC_COLUMNS, STAGED_TABLE, firstOf } from './import-rows';

export type { Actor } from '@/server/auth/actor';

const STAGED = `${STAGED_TABLE} st`;
/**
 * The staged rows read through (batch_id, firsts), for steps that need only a few rows (each
 * make's, model's or source's first); components are many, and a plain scan reads them faster.
 */
const FIRSTS = `${STAGED_TABLE} st FORCE INDEX (idx_import_batch_rows_firsts)`;
const CREATED = "st.batch_id = ? AND st.action = 'create'";
/** A key that MariaDB's collation finds equal to one already inserted this statement is the same row. */
const sameRow = (table: string) => `ON DUPLICATE KEY UPDATE ${table}.id = ${table}.id`;
/** Batch number → library id, per connection, for this commit only. */
const MAPS = ['import_model_ids', 'import_component_ids', 'import_source_ids'];

/** The spec columns a staged row sets, as staged under the same names. */
const SPEC_COLUMNS = STAGED_SPEC_COLUMNS.join(', ');
const FROM_STAGED = STAGED_SPEC_COLUMNS.map((c) => `st.${c}`).join(', ');
const SET_FROM_STAGED = STAGED_SPEC_COLUMNS.map((c) => `s.${c} = st.${c}`).join(', ');

const stale = (detail: string, extras: Record<string, unknown> = {}) =>
  AppError.conflict(`${detail} Upload the file again to see a fresh preview.`, extras);

/** Updated and unchanged rows were planned against a spec version; it must not have moved. */
async function checkNotStale(m: EntityManager, batchId: number) {
  const [moved] = await m.query(
    `SELECT st.line, st.spec_id AS specId FROM ${STAGED} LEFT JOIN specs s ON s.id = st.spec_id
      WHERE st.batch_id = ? AND st.action IN ('update', 'unchanged') AND (s.id IS NULL OR s.version <> st.base_version)
      ORDER BY st.line LIMIT 1`,
    [batchId],
  );
  if (moved)
    throw stale(`The spec on line ${moved.line} was changed by someone else after this preview.`, {
      line: moved.line,
      specId: moved.specId,
    });
}

async function dropMaps(m: EntityManager) {
  await m.query(`DROP TEMPORARY TABLE IF EXISTS ${MAPS.join(', ')}`);
}

/*
 * Every statement below reads the staged rows first (STRAIGHT_JOIN) and looks the library
 * up by index from them: left to itself the optimizer may start from a small library table
 * and scan the whole batch once per row of it.
 */

/** The highest id, read FOR UPDATE: new rows take the ids above it, and nobody else can meanwhile. */
async function highestId(m: EntityManager, table: string): Promise<number> {
  const [{ top }] = await m.query(`SELECT COALESCE(MAX(id), 0) AS top FROM ${table} FOR UPDATE`);
  return Number(top);
}

/**
 * Models and components: first the batch number → id map (the existing id, or base + number
 * for a new one), then the new rows with those ids, so each is looked up once.
 */
async function ensureModelsAndComponents(m: EntityManager, b: number) {
  const models = await highestId(m, 'vehicle_models');
  await m.query(
    `INSERT INTO import_model_ids SELECT STRAIGHT_JOIN st.model_ord, COALESCE(vm.id, ? + st.model_ord)
      FROM ${FIRSTS} LEFT JOIN vehicle_models vm ON vm.model_key = st.model_key
     WHERE ${CREATED} AND ${firstOf(FIRST.model)}`,
    [models, b],
  );
  await m.query(
    `INSERT INTO vehicle_models (id, make_id, name, year_from, year_to, variant, model_key)
    SELECT STRAIGHT_JOIN mi.id, mk.id, st.model, st.year_from, st.year_to, st.variant, st.model_key
      FROM ${FIRSTS} JOIN import_model_ids mi ON mi.ord = st.model_ord JOIN makes mk ON mk.name_key = st.make_key
     WHERE ${CREATED} AND ${firstOf(FIRST.model)} AND mi.id > ?`,
    [b, models],
  );
  const components = await highestId(m, 'components');
  await m.query(
    `INSERT INTO import_component_ids SELECT STRAIGHT_JOIN st.component_ord, COALESCE(c.id, ? + st.component_ord)
      FROM ${STAGED} JOIN import_model_ids mi ON mi.ord = st.model_ord
      LEFT JOIN components c ON c.model_id = mi.id AND c.name_key = st.component_key
     WHERE ${CREATED} AND ${firstOf(FIRST.component)}`,
    [components, b],
  );
  await m.query(
    `INSERT INTO components (id, model_id, name, name_key)
    SELECT STRAIGHT_JOIN ci.id, mi.id, st.component, st.component_key
      FROM ${STAGED} JOIN import_component_ids ci ON ci.ord = st.component_ord JOIN import_model_ids mi ON mi.ord = st.model_ord
     WHERE ${CREATED} AND ${firstOf(FIRST.component)} AND ci.id > ?`,
    [b, components],
  );
}

/** Makes, models, components and sources the batch needs and the library lacks, and their ids by batch number. */
async function ensureLibrary(m: EntityManager, b: number) {
  for (const map of MAPS)
    await m.query(`CREATE TEMPORARY TABLE ${map} (ord int PRIMARY KEY, id int NOT NULL) ENGINE=MEMORY`);
  await m.query(
    `INSERT INTO makes (name, name_key) SELECT STRAIGHT_JOIN st.make, st.make_key
      FROM ${FIRSTS} LEFT JOIN makes mk ON mk.name_key = st.make_key
     WHERE ${CREATED} AND ${firstOf(FIRST.make)} AND mk.id IS NULL ${sameRow('makes')}`,
    [b],
  );
  await ensureModelsAndComponents(m, b);
  await m.query(
    `INSERT INTO sources (title, edition, url, kind, source_key)
    SELECT STRAIGHT_JOIN st.source_title, st.source_edition, st.source_url, 'service_manual', st.source_key
      FROM ${FIRSTS} LEFT JOIN sources src ON src.source_key = st.source_key
     WHERE st.batch_id = ? AND ${firstOf(FIRST.source)} AND src.id IS NULL ${sameRow('sources')}`,
    [b],
  );
  await m.query(
    `INSERT INTO import_source_ids SELECT STRAIGHT_JOIN st.source_ord, src.id
      FROM ${FIRSTS} JOIN sources src ON src.source_key = st.source_key
     WHERE st.batch_id = ? AND ${firstOf(FIRST.source)}`,
    [b],
  );
}

const isDuplicate = (err: unknown) => (err as { driverError?: { code?: string } }).driverError?.code === 'ER_DUP_ENTRY';

/**
 * Created specs get the ids after the highest one, in file order (id = base + create_ord),
 * so their revisions need no lookup. Reading the highest id FOR UPDATE locks the end of
 * the index: another writer's new spec waits for this commit instead of taking an id.
 */
async function insertSpecs(m: EntityManager, batchId: number, expected: number): Promise<number> {
  const base = await highestId(m, 'specs');
  let result: { affectedRows: number };
  try {
    result = await m.query(
      `INSERT INTO specs (id, component_id, parameter_key, quantity_kind, ${SPEC_COLUMNS}, source_id, status, version)
      SELECT STRAIGHT_JOIN ? + st.create_ord, ci.id, st.parameter_key, st.quantity_kind, ${FROM_STAGED}, si.id, 'published', 1
        FROM ${STAGED} JOIN import_component_ids ci ON ci.ord = st.component_ord JOIN import_source_ids si ON si.ord = st.source_ord
       WHERE ${CREATED}`,
      [base, batchId],
    );
  } catch (err) {
    if (isDuplicate(err)) throw stale('A spec this file would create was created by someone else after this preview.');
    throw err;
  }
  if (result.affectedRows !== expected) throw stale('The library changed under this import after the preview.');
  return base;
}

/** Each update names the version it was planned on; any other version means a lost update. */
async function updateSpecs(m: EntityManager, batchId: number, expected: number) {
  const result = await m.query(
    `UPDATE ${STAGED} STRAIGHT_JOIN specs s ON s.id = st.spec_id STRAIGHT_JOIN import_source_ids si ON si.ord = st.source_ord
       SET s.quantity_kind = st.quantity_kind, ${SET_FROM_STAGED}, s.source_id = si.id, s.version = s.version + 1
     WHERE st.batch_id = ? AND st.action = 'update' AND s.version = st.base_version`,
    [batchId],
  );
  if (result.affectedRows !== expected)
    throw stale('A spec this file would update was changed by someone else after this preview.');
}

const REVISION =
  'INSERT INTO spec_revisions (spec_id, version, snapshot, changed_fields, author_id, author_name, reason, origin, origin_ref)';
/**
 * The revision snapshot (lib/contracts/spec-snapshot.ts snapshotOfSpec, in its key order) of
 * the spec row `s` as this commit wrote it, citing the source `src`.
 */
const SNAPSHOT = `JSON_OBJECT(${COLUMN_FIELDS.map((f) =>
  [
    ...(f.key === 'sourcePage'
      ? ["'sourceId', src.id", "'sourceTitle', src.title", "'sourceEdition', src.edition"]
      : []),
    `'${f.key}', s.${f.column}`,
  ].join(', '),
).join(', ')})`;
const CITED = 'JOIN import_source_ids si ON si.ord = st.source_ord JOIN sources src ON src.id = si.id';

async function insertRevisions(
  m: EntityManager,
  batchId: number,
  base: number,
  author: unknown[],
  counts: { created: number; updated: number },
) {
  if (counts.created > 0) {
    await m.query(
      `${REVISION} SELECT STRAIGHT_JOIN s.id, 1, ${SNAPSHOT}, '["created"]', ?, ?, ?, 'import', ?
        FROM ${STAGED} JOIN specs s ON s.id = ? + st.create_ord ${CITED} WHERE ${CREATED}`,
      [...author, base, batchId],
    );
  }
  if (counts.updated > 0) {
    await m.query(
      `${REVISION} SELECT STRAIGHT_JOIN s.id, s.version, ${SNAPSHOT}, JSON_EXTRACT(st.changes, '$[*].field'), ?, ?, ?, 'import', ?
        FROM ${STAGED} JOIN specs s ON s.id = st.spec_id ${CITED} WHERE st.batch_id = ? AND st.action = 'update'`,
      [...author, batchId],
    );
  }
}

/** Applies a staged batch; the caller holds the transaction and has locked the batch row. */
export async function applyImport(
  m: EntityManager,
  batchId: number,
  actor: Actor,
  reason: string,
  counts: { created: number; updated: number },
): Promise<void> {
  await checkNotStale(m, batchId);
  if (counts.created + counts.updated === 0) return;
  await dropMaps(m);
  try {
    await ensureLibrary(m, batchId).catch((err) => {
      if (!isDuplicate(err)) throw err;
      throw stale(
        'Another import or edit created the same make, model or component meanwhile, or this file spells one of them in two ways the library treats as the same (e.g. with and without accents).',
      );
    });
    const base = counts.created > 0 ? await insertSpecs(m, batchId, counts.created) : 0;
    if (counts.updated > 0) await updateSpecs(m, batchId, counts.updated);
    await insertRevisions(m, batchId, base, [actor.id, actor.name, reason, `batch #${batchId}`], counts);
  } finally {
    await dropMaps(m).catch(() => undefined);
  }
}
