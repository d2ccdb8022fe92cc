/**
 * Hardening, item 3: no account enumeration by timing. Sign-in and forgot-password take
 * as long for an address without an account as for one with an account. Runs alternate
 * known and unknown, and medians are compared, so a busy machine slows both alike.
 * Uses the test environment's configured bcrypt cost (BCRYPT_COST, default 11).
 */
import request from 'supertest';
import bcrypt from 'bcryptjs';
import { createApp } from '@/server/app';
import { config } from '@/server/config';
import { dummyPasswordHash } from '@/server/modules/accounts/passwords';
import { useTestDatabase } from '../helpers/test-db';
import { accountWithPassword } from '../helpers/auth';

useTestDatabase();
const app = createApp({ webDist: null });
const RUNS = 11;

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const relativeGap = (a: number, b: number) => Math.abs(a - b) / Math.max(a, b);
let seq = 0;
const unknownAddress = () => `nobody-${Date.now()}-${(seq += 1)}@shop.specbench.example`;
// A client address of its own per request (trust proxy is loopback, as behind nginx), so the
// per-client limits do not cut the runs short; the per-address ones still apply.
const client = () => `198.51.100.${(seq += 1) % 250}`;

async function timed(send: () => Promise<request.Response>, status: number): Promise<number> {
  const start = process.hrtime.bigint();
  const res = await send();
  const ms = Number(process.hrtime.bigint() - start) / 1e6;
  expect(res.status).toBe(status);
  return ms;
}

/** Alternating runs of two requests (after one warm-up each; which goes first alternates too): medians in ms. */
async function compare(
  known: () => Promise<request.Response>,
  unknown: () => Promise<request.Response>,
  status: number,
) {
  await timed(known, status);
  await timed(unknown, status);
  const k: number[] = [];
  const u: number[] = [];
  for (let i = 0; i < RUNS; i += 1) {
    if (i % 2) u.push(await timed(unknown, status));
    k.push(await timed(known, status));
    if (!(i % 2)) u.push(await timed(unknown, status));
  }
  return { known: median(k), unknown: median(u) };
}

describe('the dummy hash for unknown addresses', () => {
  it('has the configured bcrypt cost, as real hashes have', async () => {
    expect(bcrypt.getRounds(await dummyPasswordHash())).toBe(config.BCRYPT_COST);
  });
});

describe('POST /api/auth/sign-in timing', () => {
  it('a wrong password for a known address and any password for an unknown one take the same time (medians < 10 % apart)', async () => {
    const user = await accountWithPassword('the-real-coil-phrase-1');
    const attempt = (email: string) =>
      request(app)
        .post('/api/auth/sign-in')
        .set('X-Forwarded-For', client())
        .send({ email, password: 'a-wrong-guess-123' });
    const m = await compare(
      () => attempt(user.email),
      () => attempt(unknownAddress()),
      401,
    );
    expect(relativeGap(m.known, m.unknown)).toBeLessThan(0.1);
  });
});

describe('POST /api/auth/forgot timing', () => {
  it('a known and an unknown address take the same time (medians < 10 % apart)', async () => {
    const users = await Promise.all(
      Array.from({ length: RUNS + 1 }, () => accountWithPassword('the-real-coil-phrase-2')),
    );
    const forgot = (email: string) =>
      request(app).post('/api/auth/forgot').set('X-Forwarded-For', client()).send({ email });
    const m = await compare(
      () => forgot(users.pop()!.email),
      () => forgot(unknownAddress()),
      202,
    );
    expect(relativeGap(m.known, m.unknown)).toBeLessThan(0.1);
  });
});
