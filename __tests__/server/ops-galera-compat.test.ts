/**
 * What a Galera cluster needs of the schema and the code (issue 15, Galera compatibility):
 * every table has a primary key, nothing takes table or named locks, and a write conflict
 * (error 1213: an InnoDB deadlock or a certification failure) that no service handled is a
 * retryable 503, never a 500.
 */
import fs from 'node:fs';
import path from 'node:path';
import express from 'express';
import request from 'supertest';
import { QueryFailedError } from 'typeorm';
import { AppDataSource } from '@/server/db/data-source';
import { errorHandler } from '@/server/middleware/error-handler';
import { expectProblem } from '../helpers/problems';
import { useTestDatabase } from '../helpers/test-db';

useTestDatabase();

function sourceFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    return e.isDirectory() ? sourceFiles(p) : p.endsWith('.ts') ? [p] : [];
  });
}

describe('Galera compatibility', () => {
  it('every table the migrations create has a primary key', async () => {
    const rows: { name: string }[] = await AppDataSource.query(
      `SELECT t.TABLE_NAME AS name FROM information_schema.TABLES t
        WHERE t.TABLE_SCHEMA = DATABASE() AND t.TABLE_TYPE = 'BASE TABLE'
          AND NOT EXISTS (SELECT 1 FROM information_schema.TABLE_CONSTRAINTS c
                           WHERE c.TABLE_SCHEMA = t.TABLE_SCHEMA AND c.TABLE_NAME = t.TABLE_NAME
                             AND c.CONSTRAINT_TYPE = 'PRIMARY KEY')`,
    );
    expect(rows.map((r) => r.name)).toEqual([]);
  });

  it('no server code takes LOCK TABLES or GET_LOCK (Galera does not replicate them)', () => {
    const offenders = sourceFiles(path.join(__dirname, '../../server')).filter((f) =>
      /LOCK\s+TABLES|GET_LOCK\s*\(/i.test(fs.readFileSync(f, 'utf8')),
    );
    expect(offenders).toEqual([]);
  });

  it.each(['ER_LOCK_DEADLOCK', 'ER_LOCK_WAIT_TIMEOUT'])(
    'an unhandled %s answers 503 with Retry-After',
    async (code) => {
      const app = express();
      app.post('/write', () => {
        throw new QueryFailedError('COMMIT', [], Object.assign(new Error('Deadlock found'), { code, errno: 1213 }));
      });
      app.use(errorHandler);
      const res = await request(app).post('/write');
      expectProblem(res, 503, 'write_conflict');
      expect(res.headers['retry-after']).toBe('2');
    },
  );
});
