/**
 * Mail is sent outside any database transaction (issue 13 item 12) and each message goes
 * once with several workers (issue 15: background work safe with N processes).
 */
import net from 'node:net';
import { createConnection } from 'mariadb';
import { AppDataSource } from '@/server/db/data-source';
import { config } from '@/server/config';
import { fakeSmtp } from '@/server/modules/mail/fake-smtp';
import { deliverDue, LEASE_MS, resetTransport } from '@/server/modules/mail/mailer';
import { OutboxMessage } from '@/server/modules/mail/outbox-message.entity';
import { useTestDatabase } from '../helpers/test-db';
import { useFakeMail } from '../helpers/mail';

useTestDatabase();
useFakeMail();

const outbox = () => AppDataSource.getRepository(OutboxMessage);
async function queue(n: number, tag: string) {
  for (let i = 0; i < n; i += 1)
    await outbox().insert({
      to: `${tag}-${i}@shop.specbench.example`,
      subject: `Message ${i}`,
      text: 'Your spec correction was accepted.',
      attempts: 0,
      nextAttemptAt: new Date(),
    });
}

beforeEach(() => AppDataSource.query('DELETE FROM outbox_messages'));

describe('a mail server that accepts connections and never answers', () => {
  let silent: net.Server;
  const sockets: net.Socket[] = [];
  beforeAll(async () => {
    silent = net.createServer((s) => sockets.push(s)); // accepts, never greets
    await new Promise<void>((resolve) => silent.listen(0, '127.0.0.1', resolve));
    config.SMTP_URL = `smtp://127.0.0.1:${(silent.address() as net.AddressInfo).port}`;
    resetTransport();
  });
  afterAll(async () => {
    config.SMTP_URL = undefined;
    resetTransport();
    for (const s of sockets) s.destroy();
    await new Promise((resolve) => silent.close(resolve));
  });

  it('costs one short bound for the batch, holds no row lock while waiting, and keeps every message for later', async () => {
    await queue(3, 'silent');
    const started = Date.now();
    const delivering = deliverDue();
    // While the worker waits on the mail server, another connection can lock the rows at once.
    await new Promise((resolve) => setTimeout(resolve, 800));
    const other = await createConnection({
      host: config.DB_HOST,
      port: config.DB_PORT,
      user: config.DB_USER,
      password: config.DB_PASSWORD,
      database: config.DB_NAME,
    });
    try {
      await other.query('SET SESSION innodb_lock_wait_timeout = 1');
      await other.beginTransaction();
      const locked = await other.query('SELECT id FROM outbox_messages FOR UPDATE NOWAIT');
      expect(locked).toHaveLength(3);
      await other.rollback();
      // The claim was committed before sending: the lease shows from outside.
      const [lease] = await other.query(
        'SELECT TIMESTAMPDIFF(SECOND, UTC_TIMESTAMP(), MIN(next_attempt_at)) AS ahead, MIN(attempts) AS a FROM outbox_messages',
      );
      expect(Number(lease.ahead)).toBeGreaterThan(LEASE_MS / 2000);
      expect(lease.a).toBe(1);
    } finally {
      await other.end();
    }
    expect(await delivering).toBe(0);
    expect(Date.now() - started).toBeLessThan(10_000);
    const rows = await outbox().find();
    expect(rows).toHaveLength(3);
    for (const row of rows) {
      expect(row).toMatchObject({ sentAt: null, attempts: 1 });
      expect(row.lastError).toEqual(expect.any(String));
      expect(row.nextAttemptAt.getTime()).toBeGreaterThan(Date.now());
      expect(row.nextAttemptAt.getTime()).toBeLessThan(Date.now() + LEASE_MS / 2);
    }
  });
});

describe('several workers at once', () => {
  it('send each message exactly once', async () => {
    await queue(24, 'once');
    const before = fakeSmtp.messages.length;
    // Four workers, as four processes would run them; each claims its own rows.
    const runs = async () => {
      let sent = 0;
      for (let i = 0; i < 6; i += 1) sent += await deliverDue(4);
      return sent;
    };
    const counts = await Promise.all([runs(), runs(), runs(), runs()]);
    expect(counts.reduce((a, b) => a + b, 0)).toBe(24);
    const delivered = fakeSmtp.messages.slice(0, fakeSmtp.messages.length - before).map((m) => m.to);
    expect(delivered).toHaveLength(24);
    expect(new Set(delivered).size).toBe(24);
    const unsent = await AppDataSource.query('SELECT COUNT(*) AS n FROM outbox_messages WHERE sent_at IS NULL');
    expect(Number(unsent[0].n)).toBe(0);
  });
});
