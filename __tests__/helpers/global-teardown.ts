import { execFileSync } from 'node:child_process';
import path from 'node:path';

/** Stops MariaDB only when the global set-up started it. */
export default async function globalTeardown() {
  const g = globalThis as { __specbenchDbStarted?: boolean };
  if (g.__specbenchDbStarted) {
    execFileSync('bash', [path.resolve(__dirname, '../../scripts/db.sh'), 'stop'], { stdio: 'inherit' });
    g.__specbenchDbStarted = false;
  }
}
