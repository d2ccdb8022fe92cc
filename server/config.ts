/**
 * Process environment, parsed once at boot. A bad value stops the process with a
 * readable message instead of failing later inside a request.
 */
import { z } from 'zod';
import fs from 'node:fs';
import path from 'node:path';

/** The project folder: the nearest parent holding package.json (source or compiled). */
function findRoot(from: string): string {
  let dir = from;
  while (!fs.existsSync(path.join(dir, 'package.json'))) {
    const parent = path.dirname(dir);
    if (parent === dir) return from;
    dir = parent;
  }
  return dir;
}

const ROOT = findRoot(__dirname);

const Env = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(8080),
  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().min(1).max(65535).default(3307),
  DB_USER: z.string().default('specbench'),
  DB_PASSWORD: z.string().default('specbench-local'),
  DB_NAME: z.string().regex(/^[A-Za-z0-9_]+$/).default('specbench'),
  DATA_DIR: z.string().optional(),
  WEB_DIST: z.string().optional(),
});

export type Config = z.infer<typeof Env> & { rootDir: string; dataDir: string; webDist: string };

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = Env.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n');
    throw new Error(`Invalid environment:\n${lines}`);
  }
  return {
    ...parsed.data,
    rootDir: ROOT,
    dataDir: parsed.data.DATA_DIR ?? path.join(ROOT, '.data'),
    webDist: parsed.data.WEB_DIST ?? path.join(ROOT, 'dist'),
  };
}

export const config = loadConfig();
