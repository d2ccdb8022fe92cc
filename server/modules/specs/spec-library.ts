/**
 * Finding or creating a new spec's place in the library by natural key (make; make +
 * model + years + variant; model + component; source title + edition). Each is one
 * `INSERT … ON DUPLICATE KEY UPDATE id = LAST_INSERT_ID(id)`, which answers the id of the
 * new or the existing row and cannot race with a concurrent writer.
 */
import type { EntityManager } from 'typeorm';
import type { CreateSpecBody, SourceInput } from '@/lib/contracts/curation';
import { foldKey, makeKey, modelKey, sourceKey } from '../library/keys';

async function upsertId(m: EntityManager, sql: string, params: unknown[]): Promise<number> {
  const result: { insertId: number } = await m.query(`${sql} ON DUPLICATE KEY UPDATE id = LAST_INSERT_ID(id)`, params);
  return Number(result.insertId);
}

export async function ensureSource(m: EntityManager, source: SourceInput): Promise<number> {
  return upsertId(
    m,
    `INSERT INTO sources (title, edition, url, kind, source_key) VALUES (?, ?, ?, 'service_manual', ?)`,
    [source.title, source.edition, source.url, sourceKey(source)],
  );
}

/** The component the new spec belongs to, with its model and make. */
export async function ensureComponent(m: EntityManager, b: CreateSpecBody): Promise<number> {
  const makeId = await upsertId(m, 'INSERT INTO makes (name, name_key) VALUES (?, ?)', [b.make, makeKey(b.make)]);
  const modelId = await upsertId(
    m,
    'INSERT INTO vehicle_models (make_id, name, year_from, year_to, variant, model_key) VALUES (?, ?, ?, ?, ?, ?)',
    [makeId, b.model, b.yearFrom, b.yearTo, b.variant, modelKey(b)],
  );
  return upsertId(m, 'INSERT INTO components (model_id, name, name_key) VALUES (?, ?, ?)', [
    modelId,
    b.component,
    foldKey(b.component),
  ]);
}
