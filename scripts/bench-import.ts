/**
 * Benchmark (DESIGN §8): a 50 000-row invented CSV validated, previewed and committed with
 * revisions through the importer's own steps, and, in the same run, MariaDB's bulk load
 * (LOAD DATA INFILE, run as the benchmarks' own account: FILE, from the bulk-load folder only) of the same file into a bare table. Prints both and the ratio
 * of the commit's throughput to the bulk load's. Uses the throwaway database
 * specbench_bench (bench.sh sets DB_NAME), migrated here and dropped at the end.
 *
 * The development machine is shared, so one pair of timings can be off by a factor of two
 * either way. The bench runs three rounds (each a new invented file of new makes, so every
 * row is created), times the bulk load right after the commit in rounds 1 and 3 and right
 * before it in round 2, prints every pair and judges the medians. Before the rounds, the
 * server's own process previews two such files over HTTP, and a fresh one the largest file
 * accepted (bench-import-server.ts): their peak resident memory is what the memory goals judge.
 */
// The server's own heap tuning (server/heap.ts), so the figures are the server's.
import '@/server/heap';
import fs from 'node:fs';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import mariadb from 'mariadb';
import { config } from '@/server/config';
import { AppDataSource } from '@/server/db/data-source';
import { ensureDatabase } from '@/server/db/ensure-database';
import { commitImport, previewImport } from '@/server/modules/imports/import.service';
import { AppError } from '@/server/errors/app-error';
import { makeBenchCsv } from './bench-import-data';
import { serverImportMemory } from './bench-import-server';
import { SPEC_CSV_COLUMNS, type SpecCsvColumn } from '@/lib/csv';
import { MAX_CSV_ROWS } from '@/lib/csv/parse';
import { MAX_UPLOAD_BYTES } from '@/server/modules/imports/import-upload';

const ROWS = 50_000;
const DB = 'specbench_bench';
const ACTOR = { id: null, name: 'Specbench benchmark' };

/** Peak resident memory while `fn` runs, sampled every 20 ms. */
async function timed<T>(fn: () => Promise<T> | T): Promise<{ value: T; seconds: number; peakMb: number }> {
  let peak = process.memoryUsage().rss;
  const sampler = setInterval(() => {
    peak = Math.max(peak, process.memoryUsage().rss);
  }, 20);
  const t = performance.now();
  try {
    const value = await fn();
    return {
      value,
      seconds: (performance.now() - t) / 1000,
      peakMb: Math.max(peak, process.memoryUsage().rss) / 2 ** 20,
    };
  } finally {
    clearInterval(sampler);
  }
}

const BARE_TABLE = `CREATE TABLE IF NOT EXISTS bulk_specs (make varchar(120), model varchar(120), year_from smallint, year_to smallint NULL,
  variant varchar(120), component varchar(120), parameter varchar(120), min_value double NULL, nominal_value double NULL,
  max_value double NULL, unit varchar(8), ref_temp_c double NULL, material varchar(8), test_points text, conditions text,
  source_title varchar(200), source_edition varchar(200), source_page varchar(200), source_url varchar(500) NULL,
  mode varchar(20) NULL, near_limit double NULL, engine_rpm int NULL, notes text) ENGINE=InnoDB`;

/**
 * LOAD DATA's column list, in the import format's own order (lib/csv/columns.ts): a column
 * that may be empty goes through a variable so that an empty cell is NULL; the others land
 * in the bulk_specs column of the same name.
 */
const NULLABLE: Partial<Record<SpecCsvColumn, string>> = {
  year_to: 'year_to',
  min: 'min_value',
  nominal: 'nominal_value',
  max: 'max_value',
  ref_temp_c: 'ref_temp_c',
  source_url: 'source_url',
  mode: 'mode',
  near_limit: 'near_limit',
  engine_rpm: 'engine_rpm',
};
const LOAD_COLUMNS = SPEC_CSV_COLUMNS.map((c) => (NULLABLE[c] ? `@${c}` : c)).join(', ');
const LOAD_SET = SPEC_CSV_COLUMNS.filter((c) => NULLABLE[c])
  .map((c) => `${NULLABLE[c]} = NULLIF(@${c}, '')`)
  .join(', ');

/** The same file through MariaDB's own loader: parsing, type conversion and the insert, nothing else. */
async function bulkLoad(file: string): Promise<number> {
  const conn = await mariadb.createConnection({
    host: config.DB_HOST,
    port: config.DB_PORT,
    user: config.DB_USER,
    password: config.DB_PASSWORD,
    database: DB,
  });
  try {
    await conn.query('DROP TABLE IF EXISTS bulk_specs');
    await conn.query(BARE_TABLE);
    const result = await conn.query(`LOAD DATA INFILE ${conn.escape(file)} INTO TABLE bulk_specs CHARACTER SET utf8mb4
      FIELDS TERMINATED BY ',' OPTIONALLY ENCLOSED BY '"' LINES TERMINATED BY '\\r\\n' IGNORE 1 LINES
      (${LOAD_COLUMNS}) SET ${LOAD_SET}`);
    return Number(result.affectedRows);
  } finally {
    await conn.end();
  }
}

const s = (seconds: number) => `${seconds.toFixed(2)} s`;
const rate = (seconds: number) => `${Math.round(ROWS / seconds).toLocaleString('en')} rows/s`;
const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

type Round = {
  preview: number;
  commit: number;
  load: number;
  peakMb: [number, number];
  bytes: Buffer;
};

async function round(n: number, file: string): Promise<Round> {
  const text = makeBenchCsv(ROWS, `Benchmake r${n}`);
  const bytes = Buffer.from(text, 'utf8');
  fs.writeFileSync(file, bytes);
  const upload = { fileName: `bench-50k-${n}.csv`, bytes };
  const loadFirst = n === 2;
  const early = loadFirst ? await timed(() => bulkLoad(file)) : null;
  // The preview validates, plans and stages the rows a chunk at a time: one step.
  const preview = await timed(() => previewImport(upload, ACTOR));
  const commit = await timed(() => commitImport(preview.value.id, ACTOR, 'Benchmark import'));
  if (commit.value.counts.created !== ROWS)
    throw new Error(`Round ${n} created ${commit.value.counts.created} specs, expected ${ROWS}`);
  const load = early ?? (await timed(() => bulkLoad(file)));
  if (load.value !== ROWS) throw new Error(`Bulk load wrote ${load.value} rows, expected ${ROWS}`);
  console.log(
    `  round ${n}: validation and preview ${s(preview.seconds)} · commit ${s(commit.seconds)} · bulk load ${s(load.seconds)}${loadFirst ? ' (before the import)' : ''} · ratio ${((100 * load.seconds) / commit.seconds).toFixed(0)} %`,
  );
  return {
    preview: preview.seconds,
    commit: commit.seconds,
    load: load.seconds,
    peakMb: [preview.peakMb, commit.peakMb],
    bytes,
  };
}

/** A 2 MB file of a million tiny rows: refused at the row limit, in bounded memory. */
async function tinyRows() {
  const bytes = Buffer.from(`${SPEC_CSV_COLUMNS.join(',')}\n${'a,b\n'.repeat(1_000_000)}`, 'utf8');
  const r = await timed(() =>
    previewImport({ fileName: 'tiny.csv', bytes }, ACTOR).then(
      () => 'previewed',
      (err) => (err instanceof AppError ? err.status : 'failed'),
    ),
  );
  console.log(
    `import of 1 000 000 tiny rows (${(bytes.length / 2 ** 20).toFixed(1)} MB): ${r.value === 413 ? `refused at the ${MAX_CSV_ROWS.toLocaleString('en')}-row limit (413)` : 'NOT refused'} in ${s(r.seconds)} · peak RSS ${r.peakMb.toFixed(0)} MB · goal ≤ 400 MB → ${r.peakMb <= 400 ? 'met' : 'MISSED'}`,
  );
}

async function main() {
  if (config.DB_NAME !== DB)
    throw new Error(`Refusing to run: DB_NAME is ${config.DB_NAME}, expected ${DB} (run through npm run bench).`);
  await ensureDatabase(DB);
  await AppDataSource.initialize();
  // MariaDB reads the file itself, from the one folder --secure-file-priv allows (scripts/lib.sh).
  const bulkDir = process.env.BULK_DIR ?? path.join(config.dataDir, 'bulk-load');
  fs.mkdirSync(bulkDir, { recursive: true });
  const file = path.join(bulkDir, `specbench-bench-${process.pid}.csv`);
  try {
    await AppDataSource.runMigrations({ transaction: 'each' });
    console.log(`import benchmark: ${ROWS.toLocaleString('en')} invented rows per file, three rounds`);
    // First, while the process holds nothing of the rounds (RSS does not shrink back after them).
    await tinyRows();
    // The goal is the server's: its own process, on the same (still empty) database.
    await serverImportMemory(ROWS, 250, { rows: MAX_CSV_ROWS, bytes: MAX_UPLOAD_BYTES - 4096 }, 400);
    const rounds: Round[] = [];
    for (const n of [1, 2, 3]) rounds.push(await round(n, file));
    const [{ specs, revisions }] = await AppDataSource.query(
      'SELECT (SELECT COUNT(*) FROM specs) AS specs, (SELECT COUNT(*) FROM spec_revisions) AS revisions',
    );
    if (Number(specs) !== 3 * ROWS || Number(revisions) !== 3 * ROWS)
      throw new Error(`Expected ${3 * ROWS} specs and revisions, found ${specs} and ${revisions}`);
    const again = await timed(() => previewImport({ fileName: 'again.csv', bytes: rounds[0].bytes }, ACTOR));

    const m = (key: 'preview' | 'commit' | 'load') => median(rounds.map((r) => r[key]));
    const total = median(rounds.map((r) => r.preview + r.commit));
    const ratio = median(rounds.map((r) => r.load / r.commit));
    console.log(
      `import (median of 3): ${(rounds[0].bytes.length / 2 ** 20).toFixed(1)} MB file · validation and preview ${s(m('preview'))} · commit ${s(m('commit'))} (${rate(m('commit'))}, one revision per spec) · end to end ${s(total)} · target ≤ 60 s → ${total <= 60 ? 'met' : 'MISSED'}`,
    );
    const changed = again.value.counts.created + again.value.counts.updated;
    const peak = (phase: number) => Math.max(...rounds.map((r) => r.peakMb[phase]));
    console.log(
      `import: peak RSS of this bench process ${peak(0).toFixed(0)} / ${peak(1).toFixed(0)} MB (validation and preview / commit; it also holds the rounds' files; the server's own figure is above) · end to end goal ≤ 6 s → ${total <= 6 ? 'met' : 'MISSED'} · re-import of the same file: ${again.value.counts.unchanged.toLocaleString('en')} unchanged, ${changed} changed, in ${s(again.seconds)}`,
    );
    console.log(`bulk load (LOAD DATA INFILE, bare table, median of 3): ${s(m('load'))} (${rate(m('load'))})`);
    console.log(
      `commit / bulk-load throughput (median of 3 pairs): ${(ratio * 100).toFixed(0)} % · target ≥ 25 % → ${ratio >= 0.25 ? 'met' : 'MISSED'}`,
    );
  } finally {
    fs.rmSync(file, { force: true });
    await AppDataSource.query(`DROP DATABASE IF EXISTS \`${DB}\``).catch(() => undefined);
    await AppDataSource.destroy();
  }
}

main().catch((err) => {
  console.error('import benchmark failed:', err);
  process.exitCode = 1;
});
