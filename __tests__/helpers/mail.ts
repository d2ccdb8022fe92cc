/** The local fake SMTP server for API tests, and reading links out of the messages it caught. */
import { fakeSmtp } from '@/server/modules/mail/fake-smtp';
import { AppDataSource } from '@/server/db/data-source';
import { deliverDue, resetTransport } from '@/server/modules/mail/mailer';

/**
 * Deletes the unsent mail that earlier files in this worker's database left queued (the
 * rate-limit and input probes queue hundreds), so this file's messages are the only ones
 * due. Safe: a jest worker runs one file at a time, and each worker has its own database.
 */
export async function emptyOutbox(): Promise<void> {
  await AppDataSource.query('DELETE FROM outbox_messages WHERE sent_at IS NULL');
}

/** Call after useTestDatabase(): the outbox is emptied once the database is connected. */
export function useFakeMail() {
  beforeAll(async () => {
    await emptyOutbox();
    await fakeSmtp.start(0);
    resetTransport();
  });
  afterAll(async () => {
    await fakeSmtp.stop();
    resetTransport();
  });
}

/** Sends everything the outbox holds, a batch at a time (bounded). */
export async function drainOutbox(): Promise<void> {
  for (let i = 0; i < 500 && (await deliverDue()) > 0; i += 1);
}

/** Sends what the outbox holds, then returns the newest message to `to`. */
export async function latestMailTo(to: string) {
  await drainOutbox();
  const mail = fakeSmtp.messages.find((m) => m.to.toLowerCase().includes(to.toLowerCase()));
  if (!mail) throw new Error(`no mail to ${to}; have: ${fakeSmtp.messages.map((m) => m.to).join(', ')}`);
  return mail;
}

export function tokenFromLink(text: string, page: 'verify' | 'reset'): string {
  const match = new RegExp(`/${page}\\?token=([A-Za-z0-9_%-]+)`).exec(text);
  if (!match) throw new Error(`no ${page} link in: ${text}`);
  return decodeURIComponent(match[1]);
}
