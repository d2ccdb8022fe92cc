/**
 * Rate limits that hold across replicas (issue 15: shared state in MariaDB): two apps
 * standing for two processes share one budget through the `rate_limits` table.
 */
import express from 'express';
import { rateLimit } from 'express-rate-limit';
import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { MariaDbRateLimitStore } from '@/server/http/rate-limit-store';
import { useTestDatabase } from '../helpers/test-db';

useTestDatabase();

function replica(prefix: string, key: (req: express.Request) => string = () => 'one-client') {
  const app = express();
  app.use(express.json());
  app.use(
    rateLimit({
      windowMs: 60_000,
      limit: 3,
      keyGenerator: key,
      store: new MariaDbRateLimitStore(prefix),
      standardHeaders: 'draft-8',
      legacyHeaders: false,
    }),
  );
  app.post('/attempt', (_req, res) => {
    res.json({ ok: true });
  });
  return app;
}

const rows = (like: string) =>
  AppDataSource.query('SELECT `key`, points, expire FROM rate_limits WHERE `key` LIKE ?', [like]);

describe('MariaDbRateLimitStore', () => {
  it('two replicas share one budget: the fourth attempt is refused whichever replica it reaches', async () => {
    const prefix = `shared-${Date.now()}`;
    const a = replica(prefix);
    const b = replica(prefix);
    await request(a).post('/attempt').expect(200);
    await request(b).post('/attempt').expect(200);
    await request(a).post('/attempt').expect(200);
    const refused = await request(b).post('/attempt').expect(429);
    expect(refused.headers['ratelimit']).toMatch(/r=0/);
    const [row] = await rows(`${prefix}:%`);
    expect(row.points).toBe(4);
    expect(Number(row.expire)).toBeGreaterThan(Date.now() + 50_000);
  });

  it('different limiters and different clients keep separate counts', async () => {
    const prefix = `separate-${Date.now()}`;
    const perClient = replica(prefix, (req) => String(req.body?.who));
    for (let i = 0; i < 3; i += 1) await request(perClient).post('/attempt').send({ who: 'x' }).expect(200);
    await request(perClient).post('/attempt').send({ who: 'x' }).expect(429);
    await request(perClient).post('/attempt').send({ who: 'y' }).expect(200);
    await request(replica(`${prefix}-other`, (req) => String(req.body?.who)))
      .post('/attempt')
      .send({ who: 'x' })
      .expect(200);
  });

  it('a key longer than the column (a long typed address) is hashed, and still counts', async () => {
    const prefix = `long-${Date.now()}`;
    const app = replica(prefix, () => `sign-in:127.0.0.1:${'a'.repeat(250)}@shop.specbench.example`);
    for (let i = 0; i < 3; i += 1) await request(app).post('/attempt').expect(200);
    await request(app).post('/attempt').expect(429);
    const [row] = await rows(`${prefix}:h:%`);
    expect(row.points).toBe(4);
  });

  it("the app's own limiters (sign-in) keep their counters in MariaDB", async () => {
    await request(createApp({ webDist: null }))
      .post('/api/auth/sign-in')
      .send({ email: 'nobody-here@shop.specbench.example', password: 'not-the-password-1' });
    const signIn = await rows('sign-in@%');
    expect(signIn.length).toBeGreaterThan(0);
  });
});
