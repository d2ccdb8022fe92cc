/**
 * Hardening, item 1: the development mailbox (which shows password-reset links) must never
 * let someone on the network take over an account.
 */
import request from 'supertest';
import { createApp } from '@/server/app';
import { DEFAULT_DEMO_PASSWORD, loadConfig } from '@/server/config';
import { isDirectLoopbackPeer } from '@/server/modules/mail/dev-mailbox.router';
import { useTestDatabase } from '../helpers/test-db';
import { expectProblem } from '../helpers/problems';

useTestDatabase();
const app = createApp({ webDist: null });

const peer = (remoteAddress: string, headers: Record<string, string> = {}) =>
  ({ socket: { remoteAddress }, headers }) as unknown as Parameters<typeof isDirectLoopbackPeer>[0];

describe('the development mailbox', () => {
  it.each(['127.0.0.1', '127.8.0.9', '::1', '::ffff:127.0.0.1'])('is shown to a direct loopback peer (%s)', (addr) => {
    expect(isDirectLoopbackPeer(peer(addr))).toBe(true);
  });

  it.each(['203.0.113.7', '10.1.2.3', '::ffff:192.0.2.1', 'fe80::1', '', '127.0.0.1.evil'])(
    'is refused to any other peer (%s)',
    (addr) => {
      expect(isDirectLoopbackPeer(peer(addr))).toBe(false);
    },
  );

  it('believes the socket, never X-Forwarded-For: a remote peer claiming loopback is refused', () => {
    expect(isDirectLoopbackPeer(peer('203.0.113.7', { 'x-forwarded-for': '127.0.0.1' }))).toBe(false);
  });

  it('refuses a request relayed by a proxy on this machine (the real client is elsewhere)', async () => {
    const res = await request(app).get('/dev/mailbox.json').set('X-Forwarded-For', '198.51.100.4');
    expectProblem(res, 404, 'not_found');
    const html = await request(app).get('/dev/mailbox').set('Forwarded', 'for=198.51.100.4');
    expect(html.status).toBe(404);
  });

  it('answers a browser on this machine', async () => {
    const res = await request(app).get('/dev/mailbox.json').expect(200);
    expect(Array.isArray(res.body)).toBe(true);
  });
});

describe('configuration', () => {
  const prod = {
    NODE_ENV: 'production',
    JWT_SECRET: 'x'.repeat(40),
    SMTP_URL: 'smtp://mail.shop.example:587',
    DEMO_PASSWORD: 'a-long-operator-secret',
  };

  it('listens on loopback unless HOST is set', () => {
    expect(loadConfig({ NODE_ENV: 'test' }).HOST).toBe('127.0.0.1');
    expect(loadConfig({ NODE_ENV: 'test', HOST: '0.0.0.0' }).HOST).toBe('0.0.0.0');
  });

  it('starts in production with a real mail server, a signing key and an operator-chosen demo password', () => {
    expect(loadConfig(prod).NODE_ENV).toBe('production');
  });

  it('refuses production with the local fake mail server (no SMTP_URL)', () => {
    const { SMTP_URL: _omit, ...env } = prod;
    expect(() => loadConfig(env)).toThrow(/SMTP_URL is required in production/);
  });

  it('refuses production with the default demo password, whether implied or typed', () => {
    const { DEMO_PASSWORD: _omit, ...env } = prod;
    expect(() => loadConfig(env)).toThrow(/DEMO_PASSWORD must be set/);
    expect(() => loadConfig({ ...prod, DEMO_PASSWORD: DEFAULT_DEMO_PASSWORD })).toThrow(/DEMO_PASSWORD must be set/);
  });

  it('keeps the development default outside production', () => {
    expect(loadConfig({ NODE_ENV: 'development' }).DEMO_PASSWORD).toBe(DEFAULT_DEMO_PASSWORD);
  });
});
