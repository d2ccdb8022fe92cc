/**
 * Run by `npm start` before the server: creates the database if needed, applies the
 * TypeORM migrations and loads the demo data. Every step is idempotent.
 */
import 'reflect-metadata';
import { config } from '../config';
import { AppDataSource } from '../db/data-source';
import { ensureDatabase } from '../db/ensure-database';
import { loadDemoLibrary } from '../db/seeds/demo-library';
import { DEMO_ACCOUNTS, ensureDemoAccounts } from '../db/seeds/demo-accounts';

async function main() {
  await ensureDatabase(config.DB_NAME);
  await AppDataSource.initialize();
  const ran = await AppDataSource.runMigrations({ transaction: 'each' });
  console.log(`[specbench] migrations: ${ran.length ? ran.map((m) => m.name).join(', ') : 'up to date'}`);
  for (const s of await loadDemoLibrary()) {
    const { created, updated, unchanged, rejected } = s.counts;
    console.log(
      `[specbench] demo library: ${created} created, ${updated} updated, ${unchanged} unchanged, ${rejected} rejected`,
    );
  }
  const created = await ensureDemoAccounts();
  await AppDataSource.destroy();
  console.log(
    `[specbench] demo accounts${created ? ` (${created} created)` : ''}, password "${config.DEMO_PASSWORD}" (DEMO_PASSWORD):`,
  );
  for (const a of DEMO_ACCOUNTS) console.log(`[specbench]   ${a.role.padEnd(11)} ${a.email}`);
  console.log(`[specbench] open http://localhost:${config.PORT}`);
}

main().catch((err) => {
  console.error('[specbench] set-up failed:', err);
  process.exit(1);
});
