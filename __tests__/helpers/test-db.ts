/**
 * Connects AppDataSource to this worker's throwaway database, migrated and loaded
 * with the demo library (both idempotent), for the file that calls useTestDatabase().
 */
import { AppDataSource } from '@/server/db/data-source';
import { ensureDatabase } from '@/server/db/ensure-database';
import { loadDemoLibrary } from '@/server/db/seeds/demo-library';
import { config } from '@/server/config';

export async function openTestDatabase() {
  await ensureDatabase(config.DB_NAME);
  if (!AppDataSource.isInitialized) await AppDataSource.initialize();
  await AppDataSource.runMigrations({ transaction: 'each' });
  await loadDemoLibrary();
}

export function useTestDatabase() {
  beforeAll(openTestDatabase, 60_000);
  afterAll(async () => {
    if (AppDataSource.isInitialized) await AppDataSource.destroy();
  });
}
