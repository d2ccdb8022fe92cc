/**
 * Least privilege for the database account (issue 13 item 14): the app's account holds no
 * global privilege (no FILE: it cannot read or write server files), and the database is
 * started without LOAD DATA LOCAL; only the benchmarks' own account may bulk-load, and only
 * from one folder.
 */
import fs from 'node:fs';
import path from 'node:path';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';

useTestDatabase();

const ACCESS_DENIED = /Access denied/;

describe("the app's database account", () => {
  it('has no global privileges: only its own specbench* databases', async () => {
    const grants: Record<string, string>[] = await AppDataSource.query('SHOW GRANTS FOR CURRENT_USER()');
    const lines = grants.map((g) => Object.values(g)[0]);
    const global = lines.filter((l) => / ON \*\.\* /.test(l));
    expect(global).toHaveLength(1);
    expect(global[0]).toMatch(/^GRANT USAGE ON \*\.\* TO/);
    expect(lines.join('\n')).not.toMatch(/\bFILE\b|SUPER|ALL PRIVILEGES ON \*\.\*/);
  });

  it('cannot read a server file into a table, nor write one', async () => {
    await AppDataSource.query('CREATE TABLE IF NOT EXISTS priv_probe (line text)');
    try {
      await expect(AppDataSource.query("LOAD DATA INFILE '/etc/hostname' INTO TABLE priv_probe")).rejects.toThrow(
        ACCESS_DENIED,
      );
      await expect(AppDataSource.query("SELECT 1 INTO OUTFILE '/tmp/specbench-probe-out'")).rejects.toThrow(
        ACCESS_DENIED,
      );
    } finally {
      await AppDataSource.query('DROP TABLE priv_probe');
    }
  });
});

describe('the MariaDB the scripts start', () => {
  // The running server may predate this change; the start command is what the next start uses.
  const lib = fs.readFileSync(path.join(__dirname, '../../scripts/lib.sh'), 'utf8');
  const start = /setsid mariadbd[\s\S]*?&\n/.exec(lib)?.[0] ?? '';

  it('refuses LOAD DATA LOCAL and confines server-side loads to the bulk-load folder', () => {
    expect(start).toMatch(/--local-infile=0/);
    expect(start).toMatch(/--secure-file-priv="\$BULK_DIR"/);
  });

  it('grants FILE to the benchmarks account alone', () => {
    const grants = /db_grant\(\) \{[\s\S]*?\n\}/.exec(lib)?.[0] ?? '';
    expect(grants).toMatch(/GRANT FILE ON \*\.\* TO '\$BENCH_DB_USER'/);
    expect(grants).toMatch(/REVOKE FILE ON \*\.\* FROM '\$DB_USER'/);
    expect(grants).not.toMatch(/GRANT FILE ON \*\.\* TO '\$DB_USER'/);
  });
});
