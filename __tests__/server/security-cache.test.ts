/**
 * Hardening, item 6: private answers are never cached. Every authenticated or
 * token-bearing answer carries `Cache-Control: no-store` (RFC 9111 §5.2.2.5), set once in
 * middleware for the whole API: a new private route gets it without remembering to.
 */
import request from 'supertest';
import { createApp } from '@/server/app';
import { ROUTE_RULES } from '@/server/auth/route-rules';
import { useTestDatabase } from '../helpers/test-db';
import { accountWithPassword, authHeader } from '../helpers/auth';

useTestDatabase();
const app = createApp({ webDist: null });
const PASSWORD = 'cache-test-coil-phrase';

const noStore = (res: request.Response) => expect(String(res.headers['cache-control'] ?? '')).toMatch(/\bno-store\b/);
const cookieOf = (res: request.Response) =>
  [res.headers['set-cookie']]
    .flat()
    .find((c) => c?.startsWith('sb_refresh='))
    ?.split(';')[0] ?? '';

describe('answers that carry tokens', () => {
  it('sign-in, refresh and a password change (each answers an access token) send no-store', async () => {
    const user = await accountWithPassword(PASSWORD);
    const signIn = await request(app).post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD });
    expect(signIn.status).toBe(200);
    noStore(signIn);
    const refresh = await request(app).post('/api/auth/refresh').set('Cookie', cookieOf(signIn)).expect(200);
    noStore(refresh);
    const changed = await request(app)
      .post('/api/auth/password')
      .set('Authorization', `Bearer ${refresh.body.accessToken}`)
      .send({ currentPassword: PASSWORD, newPassword: 'cache-test-new-phrase-2' })
      .expect(200);
    noStore(changed);
    const me = await request(app).get('/api/auth/me').set('Authorization', `Bearer ${changed.body.accessToken}`);
    expect(me.status).toBe(200);
    noStore(me);
  });

  it('a refused sign-in sends no-store too', async () => {
    noStore(await request(app).post('/api/auth/sign-in').send({ email: 'nobody@shop.example', password: 'x' }));
  });
});

describe('signed-in answers', () => {
  it('a job, its sheet and its readings.csv send no-store', async () => {
    const me = await authHeader('contributor', 'cache-jobs');
    const job = await request(app).post('/api/jobs').set(me).send({ machineLabel: 'Cache test bike' }).expect(201);
    noStore(job);
    for (const url of ['/api/jobs', `/api/jobs/${job.body.id}`, `/api/jobs/${job.body.id}/readings.csv`]) {
      const res = await request(app).get(url).set(me);
      expect({ url, status: res.status }).toEqual({ url, status: 200 });
      noStore(res);
    }
  });

  it('users and corrections send no-store', async () => {
    const admin = await authHeader('admin', 'cache-admin');
    for (const url of ['/api/users', '/api/corrections', '/api/corrections/summary']) {
      const res = await request(app).get(url).set(admin);
      expect({ url, status: res.status }).toEqual({ url, status: 200 });
      noStore(res);
    }
  });

  it('a public route read with a bearer token sends no-store (what it shows depends on who asks)', async () => {
    const editor = await authHeader('editor', 'cache-editor');
    const res = await request(app).get('/api/search?q=coil').set(editor);
    expect(res.status).toBe(200);
    noStore(res);
  });
});

describe.each(Object.entries(ROUTE_RULES).filter(([key, rule]) => rule !== 'public' || key.includes('/api/auth/')))(
  '%s',
  (key) => {
    it('answers with no-store, whatever the outcome', async () => {
      const [method, path] = key.split(' ');
      const url = path.replace(/:[a-zA-Z]+/g, '1');
      const req = request(app)
        [method.toLowerCase() as 'get'](url)
        .set(await authHeader('admin', 'cache-walker'));
      const res = method === 'GET' ? await req : await req.send({});
      noStore(res);
    });
  },
);
