/**
 * Jest global set-up for the server and e2e projects: MariaDB must be up (started
 * here when it is not, and stopped again by the teardown), and the throwaway test
 * databases of an earlier run are dropped so every run starts from migrations.
 */
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import mariadb from 'mariadb';

const ROOT = path.resolve(__dirname, '../..');

export default async function globalSetup() {
  const g = globalThis as { __specbenchDbStarted?: boolean; __specbenchCleaned?: boolean };
  const out = execFileSync('bash', [path.join(ROOT, 'scripts/db.sh'), 'start'], {
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  if (out.trim() === 'started') g.__specbenchDbStarted = true;
  if (g.__specbenchCleaned) return;
  const conn = await mariadb.createConnection({
    host: process.env.DB_HOST ?? '127.0.0.1',
    port: Number(process.env.DB_PORT ?? 3307),
    user: process.env.DB_USER ?? 'specbench',
    password: process.env.DB_PASSWORD ?? 'specbench-local',
  });
  try {
    const prefix = (process.env.TEST_DB_PREFIX ?? 'specbench_t').replace(/[^A-Za-z0-9_]/g, '').replace(/_/g, '\\_');
    const rows: { name: string }[] = await conn.query(
      `SELECT SCHEMA_NAME AS name FROM information_schema.SCHEMATA WHERE SCHEMA_NAME LIKE '${prefix}\\_%'`,
    );
    for (const r of rows) await conn.query(`DROP DATABASE \`${r.name}\``);
  } finally {
    await conn.end();
  }
  g.__specbenchCleaned = true;
}
