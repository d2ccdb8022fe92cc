/**
 * The search bench's edit check: a spec edit, a create and a revert written straight to
 * MariaDB with their library_changes rows, as another server process would write them
 * (no local nudge), timed until the index answers with the new state. The database is left
 * as it was.
 */
import { performance } from 'node:perf_hooks';
import { setTimeout as sleep } from 'node:timers/promises';
import { AppDataSource } from '@/server/db/data-source';
import type { SearchEngine } from '@/server/modules/search/search-engine';
import type { SearchIndex } from '@/server/modules/search/search-index';
import type { IndexedSpec } from '@/server/modules/search/search.queries';
import { foldKey } from '@/server/modules/library/keys';
import { recordSpecChange } from '@/server/modules/library/library-changes';

async function until(check: () => Promise<boolean>): Promise<number> {
  const t = performance.now();
  while (!(await check()) && performance.now() - t < 10_000) await sleep(5);
  return performance.now() - t;
}

async function setParameter(id: number, parameter: string) {
  await AppDataSource.transaction(async (m) => {
    await m.query('UPDATE specs SET parameter = ?, parameter_key = ? WHERE id = ?', [
      parameter,
      foldKey(parameter),
      id,
    ]);
    await recordSpecChange(m, id);
  });
}

const finds = async (index: SearchIndex<IndexedSpec>, q: string, id: number) =>
  (await index.searchAsync(q, 40)).matches.some((m) => m.doc.specId === id);

export async function followEdits(engine: SearchEngine, index: SearchIndex<IndexedSpec>) {
  engine.follower.start();
  const [spec] = await AppDataSource.query(
    'SELECT id, parameter, component_id AS componentId FROM specs ORDER BY id LIMIT 1 OFFSET 777',
  );
  const word = `zqedit${Date.now().toString(36)}`;
  await setParameter(spec.id, `${word} resistance`);
  const edit = await until(() => finds(index, word, spec.id));
  await setParameter(spec.id, spec.parameter);
  const revert = await until(async () => !(await finds(index, word, spec.id)));
  const created = await AppDataSource.transaction(async (m) => {
    const r = await m.query(
      `INSERT INTO specs (component_id, parameter, parameter_key, quantity_kind, nominal_value, unit, status, version)
       VALUES (?, ?, ?, 'resistance', 1, 'Ω', 'published', 1)`,
      [spec.componentId, `${word}new resistance`, `${word}new resistance`],
    );
    await recordSpecChange(m, Number(r.insertId));
    return Number(r.insertId);
  });
  const create = await until(() => finds(index, `${word}new`, created));
  await AppDataSource.query('DELETE FROM specs WHERE id = ?', [created]);
  await AppDataSource.query('DELETE FROM library_changes');
  const worst = Math.max(edit, revert, create);
  console.log(
    `search after a write by another process: edit ${edit.toFixed(0)} ms · revert ${revert.toFixed(0)} ms · create ${create.toFixed(0)} ms (incremental, no rebuild; goal ≤ 1000 ms → ${worst <= 1000 ? 'met' : 'MISSED'})`,
  );
}
