import request from 'supertest';
import jwt from 'jsonwebtoken';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { config } from '@/server/config';
import { EmailToken } from '@/server/modules/accounts/email-token.entity';
import { sha256Hex } from '@/server/auth/tokens';
import { useTestDatabase } from '../helpers/test-db';
import { latestMailTo, tokenFromLink, useFakeMail } from '../helpers/mail';

useTestDatabase();
useFakeMail();
const app = createApp({ webDist: null });
const PASSWORD = 'winding-coil-7-quiet';

let seq = 0;
const newEmail = () => `tech${Date.now()}${(seq += 1)}@shop.specbench.example`;

async function signUpAndVerify(email = newEmail(), password = PASSWORD) {
  await request(app).post('/api/auth/sign-up').send({ email, displayName: 'Rowan Tester', password }).expect(202);
  const token = tokenFromLink((await latestMailTo(email)).text, 'verify');
  await request(app).post('/api/auth/verify').send({ token }).expect(200);
  return email;
}

async function signIn(email: string, password = PASSWORD) {
  const res = await request(app).post('/api/auth/sign-in').send({ email, password });
  const cookie = [res.headers['set-cookie']].flat().find((c) => c?.startsWith('sb_refresh=')) ?? '';
  return { res, cookie: cookie.split(';')[0] };
}

describe('sign up, verify, sign in', () => {
  it('a new account gets a verification link, and can sign in only once verified', async () => {
    const email = newEmail();
    await request(app)
      .post('/api/auth/sign-up')
      .send({ email, displayName: 'Rowan Tester', password: PASSWORD })
      .expect(202);
    expect((await signIn(email)).res.body.code).toBe('email_not_verified');
    const mail = await latestMailTo(email);
    expect(mail.subject).toMatch(/confirm/i);
    await request(app)
      .post('/api/auth/verify')
      .send({ token: tokenFromLink(mail.text, 'verify') })
      .expect(200);
    const { res, cookie } = await signIn(email.toUpperCase());
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email, role: 'contributor', emailVerified: true });
    expect(cookie).toMatch(/^sb_refresh=/);
    expect([res.headers['set-cookie']].flat().join(';')).toMatch(
      /HttpOnly.*SameSite=Strict|SameSite=Strict.*HttpOnly/i,
    );
    const me = await request(app)
      .get('/api/auth/me')
      .set('Authorization', `Bearer ${res.body.accessToken}`)
      .expect(200);
    expect(me.body.email).toBe(email);
  });

  it('access tokens are short-lived (at most 15 minutes) and pinned to HS256 with issuer and audience', async () => {
    const { res } = await signIn(await signUpAndVerify());
    const decoded = jwt.decode(res.body.accessToken, { complete: true }) as jwt.Jwt & { payload: jwt.JwtPayload };
    expect(decoded.header.alg).toBe('HS256');
    expect(decoded.payload.exp! - decoded.payload.iat!).toBeLessThanOrEqual(15 * 60);
    expect(decoded.payload).toMatchObject({ iss: 'specbench', aud: 'specbench-app' });
  });

  it('signing up again with the same address reveals nothing and creates no second account', async () => {
    const email = await signUpAndVerify();
    const res = await request(app)
      .post('/api/auth/sign-up')
      .send({ email: email.toUpperCase(), displayName: 'Someone Else', password: PASSWORD });
    expect(res.status).toBe(202);
    const [row] = await AppDataSource.query('SELECT COUNT(*) AS n FROM users WHERE email_key = ?', [
      email.toLowerCase(),
    ]);
    expect(Number(row.n)).toBe(1);
  });

  it.each([
    [{ displayName: 'Ro', password: PASSWORD }, 'email', 400],
    [{ email: 'not-an-email', displayName: 'Ro', password: PASSWORD }, 'email', 400],
    [{ email: 'a@b.example', displayName: 'Ro', password: 'short-pass' }, 'password', 400],
    [{ email: 'a@b.example', displayName: 'Ro', password: PASSWORD, role: 'admin' }, '(root)', 400],
    [{ email: 'a@b.example', displayName: 'Ro', password: 'password12345' }, 'password', 422],
  ])('sign-up %j is refused naming %s', async (body, field, status) => {
    const res = await request(app).post('/api/auth/sign-up').send(body);
    expect(res.status).toBe(status);
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(field);
  });

  it('a verification link works once', async () => {
    const email = newEmail();
    await request(app)
      .post('/api/auth/sign-up')
      .send({ email, displayName: 'Rowan Tester', password: PASSWORD })
      .expect(202);
    const token = tokenFromLink((await latestMailTo(email)).text, 'verify');
    await request(app).post('/api/auth/verify').send({ token }).expect(200);
    const again = await request(app).post('/api/auth/verify').send({ token });
    expect(again.status).toBe(400);
    expect(again.body.code).toBe('token_used');
  });

  it('a wrong password and an unknown e-mail get the same answer', async () => {
    const email = await signUpAndVerify();
    const wrong = await signIn(email, 'not-the-password-1');
    const unknown = await signIn(newEmail(), 'not-the-password-1');
    expect(wrong.res.status).toBe(401);
    expect(unknown.res.status).toBe(401);
    expect(wrong.res.body.detail).toBe(unknown.res.body.detail);
  });
});

describe('bearer tokens', () => {
  const call = (token: string) => request(app).get('/api/auth/me').set('Authorization', `Bearer ${token}`);

  it.each([
    [
      'alg none',
      () =>
        jwt.sign({ role: 'admin' }, '', {
          algorithm: 'none',
          subject: '1',
          issuer: 'specbench',
          audience: 'specbench-app',
        }),
    ],
    [
      'another key',
      () =>
        jwt.sign({ role: 'admin' }, 'some-other-secret-that-is-long-enough', {
          algorithm: 'HS256',
          subject: '1',
          issuer: 'specbench',
          audience: 'specbench-app',
        }),
    ],
    [
      'expired',
      () =>
        jwt.sign({ role: 'admin', exp: Math.floor(Date.now() / 1000) - 60 }, config.jwtSecret, {
          algorithm: 'HS256',
          subject: '1',
          issuer: 'specbench',
          audience: 'specbench-app',
        }),
    ],
    [
      'another audience',
      () =>
        jwt.sign({ role: 'admin' }, config.jwtSecret, {
          algorithm: 'HS256',
          subject: '1',
          issuer: 'specbench',
          audience: 'other-app',
        }),
    ],
    ['garbage', () => 'not.a.jwt'],
  ])('a token with %s is refused with 401', async (_name, make) => {
    const res = await call(make());
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthorized');
  });
});

describe('refresh tokens', () => {
  const cookieOf = (res: request.Response) =>
    [res.headers['set-cookie']]
      .flat()
      .find((c) => c?.startsWith('sb_refresh='))!
      .split(';')[0];
  const ageReplacement = (cookie: string) =>
    AppDataSource.query('UPDATE refresh_tokens SET replaced_at = NOW(3) - INTERVAL 1 MINUTE WHERE token_hash = ?', [
      sha256Hex(cookie.slice('sb_refresh='.length)),
    ]);

  it('rotate on every refresh; reusing an old one closes the whole family', async () => {
    const { cookie: first } = await signIn(await signUpAndVerify());
    const r1 = await request(app).post('/api/auth/refresh').set('Cookie', first).expect(200);
    const second = cookieOf(r1);
    expect(second).not.toBe(first);
    expect(r1.body.accessToken).toEqual(expect.any(String));
    await ageReplacement(first);
    const reuse = await request(app).post('/api/auth/refresh').set('Cookie', first);
    expect(reuse.status).toBe(401);
    expect(reuse.body.code).toBe('session_reused');
    // The legitimate newest token is revoked with its family.
    expect((await request(app).post('/api/auth/refresh').set('Cookie', second)).status).toBe(401);
  });

  it('a token replaced seconds ago (a reload cut off the answer) gets the same successor again', async () => {
    const { cookie: first } = await signIn(await signUpAndVerify());
    const second = cookieOf(await request(app).post('/api/auth/refresh').set('Cookie', first).expect(200));
    const again = await request(app).post('/api/auth/refresh').set('Cookie', first).expect(200);
    expect(cookieOf(again)).toBe(second);
    await request(app).post('/api/auth/refresh').set('Cookie', second).expect(200);
  });

  it('sign-out revokes the session', async () => {
    const { cookie } = await signIn(await signUpAndVerify());
    await request(app).post('/api/auth/sign-out').set('Cookie', cookie).expect(204);
    expect((await request(app).post('/api/auth/refresh').set('Cookie', cookie)).status).toBe(401);
  });

  it('a cross-site request to refresh is refused', async () => {
    const { cookie } = await signIn(await signUpAndVerify());
    const res = await request(app)
      .post('/api/auth/refresh')
      .set('Cookie', cookie)
      .set('Origin', 'https://evil.example');
    expect(res.status).toBe(403);
  });
});

describe('forgot and reset password', () => {
  it('answers the same for known and unknown addresses, and the link resets the password once', async () => {
    const email = await signUpAndVerify();
    const known = await request(app).post('/api/auth/forgot').send({ email }).expect(202);
    const unknown = await request(app).post('/api/auth/forgot').send({ email: newEmail() }).expect(202);
    expect(known.body).toEqual(unknown.body);
    const token = tokenFromLink((await latestMailTo(email)).text, 'reset');
    await request(app).post('/api/auth/reset').send({ token, password: 'new-stator-phrase-42' }).expect(200);
    expect((await signIn(email)).res.status).toBe(401);
    expect((await signIn(email, 'new-stator-phrase-42')).res.status).toBe(200);
    const reused = await request(app).post('/api/auth/reset').send({ token, password: 'another-phrase-4321' });
    expect(reused.body.code).toBe('token_used');
  });

  it('a reset link expires after 30 minutes', async () => {
    const email = await signUpAndVerify();
    await request(app).post('/api/auth/forgot').send({ email }).expect(202);
    const token = tokenFromLink((await latestMailTo(email)).text, 'reset');
    const row = await AppDataSource.getRepository(EmailToken).findOneByOrFail({
      purpose: 'reset',
      tokenHash: sha256Hex(token),
    });
    expect(row.expiresAt.getTime() - row.createdAt.getTime()).toBeLessThanOrEqual(30 * 60_000 + 1000);
    await AppDataSource.getRepository(EmailToken).update(row.id, { expiresAt: new Date(Date.now() - 1000) });
    const res = await request(app).post('/api/auth/reset').send({ token, password: 'new-stator-phrase-42' });
    expect(res.body.code).toBe('token_expired');
  });
});

describe('rate limits', () => {
  it('too many sign-in attempts get 429 problem details with Retry-After', async () => {
    const email = newEmail();
    let last: request.Response | undefined;
    for (let i = 0; i < 11; i += 1) last = (await signIn(email, 'wrong-password-000')).res;
    expect(last!.status).toBe(429);
    expect(last!.headers['content-type']).toMatch(/problem\+json/);
    expect(Number(last!.headers['retry-after'])).toBeGreaterThan(0);
  });
});
