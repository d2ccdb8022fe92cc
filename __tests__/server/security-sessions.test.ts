/**
 * Hardening, item 5: sessions that really end. A replayed refresh token never starts a
 * second chain, a session ends 30 days after sign-in however often it is refreshed, and an
 * access token stops working the moment its session ends (not when it expires).
 */
import request from 'supertest';
import jwt from 'jsonwebtoken';
import { createApp } from '@/server/app';
import { config } from '@/server/config';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';
import { latestMailTo, tokenFromLink, useFakeMail } from '../helpers/mail';
import { accountWithPassword, sessionFor } from '../helpers/auth';

useTestDatabase();
useFakeMail();
const app = createApp({ webDist: null });
const PASSWORD = 'ignition-lead-quiet-88';
const DAY = 86_400_000;

const cookieOf = (res: request.Response) =>
  [res.headers['set-cookie']]
    .flat()
    .find((c) => c?.startsWith('sb_refresh='))
    ?.split(';')[0] ?? '';
const maxAgeOf = (res: request.Response) =>
  Number(
    /Max-Age=(\d+)/i.exec([res.headers['set-cookie']].flat().find((c) => c?.startsWith('sb_refresh=')) ?? '')?.[1],
  );

async function signedIn() {
  const user = await accountWithPassword(PASSWORD);
  const res = await request(app).post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD }).expect(200);
  return { user, cookie: cookieOf(res), accessToken: res.body.accessToken as string };
}
const me = (token: string) => request(app).get('/api/auth/me').set('Authorization', `Bearer ${token}`);
const refresh = (cookie: string) => request(app).post('/api/auth/refresh').set('Cookie', cookie);

describe('a replayed refresh token', () => {
  it('within the grace window gets the very same successor, however often it is replayed', async () => {
    const { cookie: first } = await signedIn();
    const second = cookieOf(await refresh(first).expect(200));
    const replays = [cookieOf(await refresh(first).expect(200)), cookieOf(await refresh(first).expect(200))];
    expect(replays).toEqual([second, second]);
    // Still one chain: the successor moves on, and the session holds exactly the two tokens.
    await refresh(second).expect(200);
    const [{ n }] = await AppDataSource.query(
      'SELECT COUNT(*) AS n FROM refresh_tokens WHERE family_id = (SELECT family_id FROM refresh_tokens WHERE token_hash = SHA2(?, 256))',
      [first.slice('sb_refresh='.length)],
    );
    expect(Number(n)).toBe(3);
  });
});

describe('the absolute session lifetime', () => {
  afterEach(() => jest.useRealTimers());
  // Only Date is faked: the database driver and supertest keep their real timers.
  const fakeDateAt = (now: number) =>
    jest.useFakeTimers({
      now,
      doNotFake: ['nextTick', 'setImmediate', 'clearImmediate', 'setInterval', 'clearInterval', 'setTimeout'],
    });

  it('is 30 days from sign-in: refreshing on day 29 does not extend it, and on day 30 it has ended', async () => {
    const { cookie } = await signedIn();
    // Taken after the sign-in answered: the session ends 30 days after a moment before this one.
    const t0 = Date.now();

    fakeDateAt(t0 + 29 * DAY);
    const day29 = await refresh(cookie).expect(200);
    expect(maxAgeOf(day29)).toBeLessThanOrEqual(DAY / 1000 + 5);
    const later = cookieOf(day29);

    fakeDateAt(t0 + 30 * DAY + 60_000);
    const day30 = await refresh(later);
    expect(day30.status).toBe(401);
    expect(day30.body.code).toBe('session_ended');
  });

  it('refuses the access tokens of a session past its end', async () => {
    const { cookie } = await signedIn();
    const t0 = Date.now();
    fakeDateAt(t0 + 30 * DAY - 60_000);
    const { accessToken } = (await refresh(cookie).expect(200)).body;
    await me(accessToken).expect(200);
    fakeDateAt(t0 + 30 * DAY + 1000);
    expect((await me(accessToken)).status).toBe(401);
  });
});

describe('an access token after its session ends', () => {
  it('is refused at once after sign-out', async () => {
    const { cookie, accessToken } = await signedIn();
    await me(accessToken).expect(200);
    await request(app).post('/api/auth/sign-out').set('Cookie', cookie).expect(204);
    expect((await me(accessToken)).status).toBe(401);
  });

  it('is refused at once after sign-out sent with the bearer token only (no cookie)', async () => {
    const { accessToken } = await signedIn();
    await request(app).post('/api/auth/sign-out').set('Authorization', `Bearer ${accessToken}`).expect(204);
    expect((await me(accessToken)).status).toBe(401);
  });

  it('is refused at once after sign-out everywhere, on every device', async () => {
    const { user, accessToken } = await signedIn();
    const other = await sessionFor(user);
    await request(app)
      .post('/api/auth/sign-out-everywhere')
      .set('Authorization', `Bearer ${other.accessToken}`)
      .expect(204);
    expect((await me(accessToken)).status).toBe(401);
    expect((await me(other.accessToken)).status).toBe(401);
  });

  it('is refused at once after a password change; the new session it answers works', async () => {
    const { user, accessToken } = await signedIn();
    const elsewhere = await sessionFor(user);
    const changed = await request(app)
      .post('/api/auth/password')
      .set('Authorization', `Bearer ${accessToken}`)
      .send({ currentPassword: PASSWORD, newPassword: 'a-new-stator-phrase-77' })
      .expect(200);
    expect((await me(accessToken)).status).toBe(401);
    expect((await me(elsewhere.accessToken)).status).toBe(401);
    await me(changed.body.accessToken).expect(200);
  });

  it('is refused at once after a password reset', async () => {
    const { user, accessToken } = await signedIn();
    await request(app).post('/api/auth/forgot').send({ email: user.email }).expect(202);
    const token = tokenFromLink((await latestMailTo(user.email)).text, 'reset');
    await request(app).post('/api/auth/reset').send({ token, password: 'reset-phrase-for-coil-3' }).expect(200);
    expect((await me(accessToken)).status).toBe(401);
  });
});

describe('access token claims', () => {
  const sign = (claims: Record<string, unknown>, options: jwt.SignOptions = {}) =>
    jwt.sign(claims, config.jwtSecret, {
      algorithm: 'HS256',
      issuer: 'specbench',
      audience: 'specbench-app',
      ...options,
    });

  it('a well-formed token of a live session is accepted (the control for the refusals below)', async () => {
    const { user } = await signedIn();
    const { sid } = await sessionFor(user);
    await me(sign({ sid }, { subject: String(user.id), expiresIn: 300 })).expect(200);
  });

  it('a token without exp is refused', async () => {
    const { user } = await signedIn();
    const { sid } = await sessionFor(user);
    const res = await me(sign({ sid }, { subject: String(user.id) }));
    expect(res.status).toBe(401);
  });

  it('a token without a session id is refused', async () => {
    const { user } = await signedIn();
    expect((await me(sign({}, { subject: String(user.id), expiresIn: 300 }))).status).toBe(401);
  });

  it('a token naming another account than its session is refused', async () => {
    const { user } = await signedIn();
    const { user: other } = await signedIn();
    const { sid } = await sessionFor(other);
    expect((await me(sign({ sid }, { subject: String(user.id), expiresIn: 300 }))).status).toBe(401);
  });

  it.each([
    ['a leading zero', (id: number) => `0${id}`],
    ['a decimal point', (id: number) => `${id}.0`],
    ['an exponent', (id: number) => `${id}e0`],
    ['a plus sign', (id: number) => `+${id}`],
    ['spaces', (id: number) => ` ${id} `],
    ['hexadecimal', (id: number) => `0x${id.toString(16)}`],
  ])('a sub with %s is refused', async (_what, form) => {
    const { user } = await signedIn();
    const { sid } = await sessionFor(user);
    const res = await me(sign({ sid }, { subject: form(user.id), expiresIn: 300 }));
    expect(res.status).toBe(401);
  });
});
