import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { fakeSmtp } from '@/server/modules/mail/fake-smtp';
import { deliverDue } from '@/server/modules/mail/mailer';
import { OutboxMessage } from '@/server/modules/mail/outbox-message.entity';
import { useTestDatabase } from '../helpers/test-db';
import { latestMailTo, useFakeMail } from '../helpers/mail';
import { authHeader, testUser } from '../helpers/auth';

useTestDatabase();
useFakeMail();
const app = createApp({ webDist: null });

describe('e-mail outbox', () => {
  // Other test files that ran earlier in this worker's database may have left mail queued.
  beforeEach(() => AppDataSource.query('DELETE FROM outbox_messages'));

  it('a sign-up while the mail server is down still succeeds, and the message is delivered once it is back', async () => {
    const email = `outage${Date.now()}@shop.specbench.example`;
    const port = fakeSmtp.port;
    await fakeSmtp.stop();
    await request(app)
      .post('/api/auth/sign-up')
      .send({ email, displayName: 'Outage Tester', password: 'plug-gap-feeler-0.7' })
      .expect(202);
    expect(await deliverDue()).toBe(0);
    const queued = await AppDataSource.getRepository(OutboxMessage).findOneByOrFail({ to: email });
    expect(queued).toMatchObject({ attempts: 1, sentAt: null });
    expect(queued.lastError).toEqual(expect.any(String));
    expect(queued.nextAttemptAt.getTime()).toBeGreaterThan(Date.now());
    await fakeSmtp.start(port);
    // Skip the back-off wait instead of sleeping through it.
    await AppDataSource.getRepository(OutboxMessage).update(queued.id, { nextAttemptAt: new Date() });
    const mail = await latestMailTo(email);
    expect(mail.subject).toMatch(/confirm/i);
    expect((await AppDataSource.getRepository(OutboxMessage).findOneByOrFail({ id: queued.id })).sentAt).not.toBeNull();
  });
});

describe('/api/users (admin)', () => {
  it('lists and searches accounts', async () => {
    const target = await testUser('contributor', 'searchable-wrench');
    const res = await request(app)
      .get('/api/users')
      .query({ q: 'wrench' })
      .set(await authHeader('admin'))
      .expect(200);
    expect(res.body.map((u: { id: number }) => u.id)).toContain(target.id);
    expect(res.body[0]).not.toHaveProperty('passwordHash');
  });

  it('changes a role and records who did it', async () => {
    const target = await testUser('contributor', 'promote-me');
    const res = await request(app)
      .patch(`/api/users/${target.id}`)
      .set(await authHeader('admin'))
      .send({ role: 'editor' })
      .expect(200);
    expect(res.body.role).toBe('editor');
    const audit = await request(app)
      .get(`/api/users/${target.id}/audit`)
      .set(await authHeader('admin'))
      .expect(200);
    expect(audit.body[0]).toMatchObject({
      action: 'role_changed',
      fromValue: 'contributor',
      toValue: 'editor',
      actorName: 'Test admin-tester',
    });
  });

  it('a disabled account is refused at once, even with a token issued before', async () => {
    const target = await testUser('editor', 'to-disable');
    const header = await authHeader('editor', 'to-disable');
    await request(app).get('/api/auth/me').set(header).expect(200);
    await request(app)
      .patch(`/api/users/${target.id}`)
      .set(await authHeader('admin'))
      .send({ disabled: true })
      .expect(200);
    expect((await request(app).get('/api/auth/me').set(header)).status).toBe(401);
    await request(app)
      .patch(`/api/users/${target.id}`)
      .set(await authHeader('admin'))
      .send({ disabled: false })
      .expect(200);
    // Disabling ended its sessions: the old token stays refused; a new sign-in works.
    expect((await request(app).get('/api/auth/me').set(header)).status).toBe(401);
    await request(app)
      .get('/api/auth/me')
      .set(await authHeader('editor', 'to-disable'))
      .expect(200);
  });

  it('an admin cannot demote or disable their own account', async () => {
    const me = await testUser('admin');
    const res = await request(app)
      .patch(`/api/users/${me.id}`)
      .set(await authHeader('admin'))
      .send({ role: 'contributor' });
    expect(res.status).toBe(422);
  });

  it.each([
    [{}, 400],
    [{ role: 'superuser' }, 400],
    [{ disabled: 'yes' }, 400],
  ])('PATCH body %j → %i', async (body, status) => {
    const target = await testUser('contributor', 'patch-target');
    expect(
      (
        await request(app)
          .patch(`/api/users/${target.id}`)
          .set(await authHeader('admin'))
          .send(body)
      ).status,
    ).toBe(status);
  });

  it('an unknown user id → 404', async () => {
    expect(
      (
        await request(app)
          .patch('/api/users/987654')
          .set(await authHeader('admin'))
          .send({ role: 'editor' })
      ).status,
    ).toBe(404);
  });

  it('a contributor cannot change roles, not even their own', async () => {
    const me = await testUser('contributor');
    const res = await request(app)
      .patch(`/api/users/${me.id}`)
      .set(await authHeader('contributor'))
      .send({ role: 'admin' });
    expect(res.status).toBe(403);
  });
});
