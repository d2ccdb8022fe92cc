/**
 * A MariaDB of a test's own (its own port, data directory and socket), for tests that
 * freeze or stop the database: never the shared one the other tests use.
 */
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

export type Throwaway = { port: number; pid: number; dir: string; stop(): Promise<void> };

export async function freePort(): Promise<number> {
  const srv = net.createServer();
  await new Promise<void>((resolve) => srv.listen(0, '127.0.0.1', resolve));
  const { port } = srv.address() as net.AddressInfo;
  await new Promise((resolve) => srv.close(resolve));
  return port;
}

export async function startThrowawayMariadb(user: string, password: string): Promise<Throwaway> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sbdb-'));
  const me = os.userInfo().username;
  execFileSync(
    'mariadb-install-db',
    [
      '--no-defaults',
      `--user=${me}`,
      `--datadir=${dir}/data`,
      '--auth-root-authentication-method=socket',
      '--skip-test-db',
      '--skip-name-resolve',
    ],
    { stdio: 'ignore' },
  );
  const port = await freePort();
  const sock = `${dir}/s`;
  const child: ChildProcess = spawn(
    'mariadbd',
    [
      '--no-defaults',
      `--user=${me}`,
      `--datadir=${dir}/data`,
      '--bind-address=127.0.0.1',
      `--port=${port}`,
      `--socket=${sock}`,
      `--pid-file=${dir}/pid`,
      `--log-error=${dir}/log`,
      '--skip-name-resolve',
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
      '--innodb-buffer-pool-size=32M',
    ],
    { stdio: 'ignore', detached: true },
  );
  const sql = (q: string) =>
    execFileSync('mariadb', ['--no-defaults', '--protocol=socket', '-S', sock, '-u', me, '-e', q], { stdio: 'pipe' });
  for (let i = 0; ; i += 1) {
    try {
      sql('SELECT 1');
      break;
    } catch (err) {
      if (i > 100)
        throw new Error(`throwaway MariaDB did not start: ${fs.readFileSync(`${dir}/log`, 'utf8')}`, { cause: err });
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  }
  sql(
    `CREATE USER '${user}'@'127.0.0.1' IDENTIFIED BY '${password}'; GRANT ALL ON \`specbench%\`.* TO '${user}'@'127.0.0.1';`,
  );
  const pid = child.pid as number;
  return {
    port,
    pid,
    dir,
    async stop() {
      try {
        process.kill(pid, 'SIGCONT');
        process.kill(pid, 'SIGTERM');
      } catch {
        // already gone
      }
      for (let i = 0; i < 100 && child.exitCode === null && child.signalCode === null; i += 1)
        await new Promise((resolve) => setTimeout(resolve, 100));
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
