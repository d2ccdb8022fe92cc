/**
 * Hardening, item 4: rate limits that cannot be sidestepped. An address is one address
 * however it is typed (spaces of any kind around it, a BOM, full-width letters, capitals),
 * forgot-password is limited per inbox from any client, and changing the password is
 * limited per account.
 */
import request from 'supertest';
import { createApp } from '@/server/app';
import { normalizeEmail } from '@/lib/contracts/auth';
import { useTestDatabase } from '../helpers/test-db';
import { accountWithPassword, sessionFor } from '../helpers/auth';

useTestDatabase();
const app = createApp({ webDist: null });

let seq = 0;
const client = () => `203.0.113.${(seq += 1) % 250}`;
const toFullWidth = (s: string) => s.replace(/[a-z]/g, (c) => String.fromCharCode(c.charCodeAt(0) + 0xfee0));

/** The same address as a browser, a paste or a phone keyboard may send it. */
const VARIANTS: [string, (e: string) => string][] = [
  ['a trailing space', (e) => `${e} `],
  ['a tab', (e) => `\t${e}`],
  ['a no-break space', (e) => `${e}\u00a0`],
  ['an ideographic space (U+3000)', (e) => `\u3000${e}`],
  ['a byte-order mark', (e) => `\ufeff${e}`],
  ['a zero-width space', (e) => `${e}\u200b`],
  ['capitals', (e) => e.toUpperCase()],
  ['full-width letters', (e) => toFullWidth(e)],
];

describe('normalizeEmail (lib/contracts/auth.ts)', () => {
  it.each(VARIANTS)('folds %s into the one form', (_what, variant) => {
    expect(normalizeEmail(variant('coil.tech@shop.example'))).toBe('coil.tech@shop.example');
  });
});

describe('POST /api/auth/sign-in per-address limit', () => {
  it('counts every way of typing the address against one budget', async () => {
    const email = `limit-${Date.now()}@shop.specbench.example`;
    const attempt = (typed: string) =>
      request(app).post('/api/auth/sign-in').send({ email: typed, password: 'wrong-guess-000' });
    for (let i = 0; i < 10; i += 1) expect((await attempt(email)).status).toBe(401);
    for (const [what, variant] of VARIANTS) {
      const res = await attempt(variant(email));
      expect({ what, status: res.status }).toEqual({ what, status: 429 });
    }
  });

  it('signs in an account whatever way the address is typed', async () => {
    const user = await accountWithPassword('stator-phrase-for-limits');
    for (const [, variant] of VARIANTS.slice(0, 4)) {
      await request(app)
        .post('/api/auth/sign-in')
        .set('X-Forwarded-For', client())
        .send({ email: variant(user.email), password: 'stator-phrase-for-limits' })
        .expect(200);
    }
  });
});

describe('POST /api/auth/forgot per-address limit', () => {
  it('refuses a fourth reset mail to one inbox within the hour, even from other clients and spellings', async () => {
    const user = await accountWithPassword('stator-phrase-for-forgot');
    const forgot = (typed: string) =>
      request(app).post('/api/auth/forgot').set('X-Forwarded-For', client()).send({ email: typed });
    for (const typed of [user.email, `${user.email} `, user.email.toUpperCase()]) {
      expect((await forgot(typed)).status).toBe(202);
    }
    const fourth = await forgot(`\u3000${user.email}`);
    expect(fourth.status).toBe(429);
    expect(Number(fourth.headers['retry-after'])).toBeGreaterThan(60);
    // Another inbox from the same clients is not affected.
    expect((await forgot(`other-${Date.now()}@shop.specbench.example`)).status).toBe(202);
  });
});

describe('POST /api/auth/password limit', () => {
  it('refuses a sixth wrong current password within 15 minutes, from any client, with Retry-After', async () => {
    const user = await accountWithPassword('stator-phrase-for-change');
    const statuses: number[] = [];
    let last: request.Response | undefined;
    for (let i = 0; i < 6; i += 1) {
      const { accessToken } = await sessionFor(user);
      last = await request(app)
        .post('/api/auth/password')
        .set('X-Forwarded-For', client())
        .set('Authorization', `Bearer ${accessToken}`)
        .send({ currentPassword: `wrong-current-${i}`, newPassword: 'a-brand-new-phrase-99' });
      statuses.push(last.status);
    }
    expect(statuses).toEqual([422, 422, 422, 422, 422, 429]);
    expect(last!.body.code).toBe('rate_limited');
    expect(Number(last!.headers['retry-after'])).toBe(last!.body.retryAfter);
  });
});
