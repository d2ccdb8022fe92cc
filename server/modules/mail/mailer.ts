/**
 * Outgoing mail. Services enqueue() inside their own transaction, so a message exists
 * exactly when the change that caused it was committed; the outbox worker sends it
 * with retries and back-off, so a mail outage delays messages and loses none.
 */
import nodemailer, { type Transporter } from 'nodemailer';
import type { EntityManager } from 'typeorm';
import { config } from '@/server/config';
import { AppDataSource } from '@/server/db/data-source';
import { fakeSmtp } from './fake-smtp';
import { subjectLine } from './subject';
import { OutboxRepository, type Mail } from './outbox.repository';

export type { Mail };

export async function enqueue(m: EntityManager, mail: Mail): Promise<void> {
  await m.withRepository(OutboxRepository).enqueue({ ...mail, subject: subjectLine(mail.subject) });
}

let transporter: Transporter | null = null;
function transport(): Transporter {
  transporter ??= config.SMTP_URL
    ? nodemailer.createTransport(config.SMTP_URL)
    : nodemailer.createTransport({
        host: '127.0.0.1',
        port: fakeSmtp.port || config.FAKE_SMTP_PORT,
        secure: false,
        ignoreTLS: true,
        connectionTimeout: 3000,
        greetingTimeout: 3000,
      });
  return transporter;
}
export function resetTransport() {
  transporter?.close();
  transporter = null;
}

/** 2 s, 4 s, 8 s … capped at 10 minutes. */
export const backoffMs = (attempts: number) => Math.min(600_000, 1000 * 2 ** attempts);

/** Sends what is due; returns how many went. Safe to run from several processes (SKIP LOCKED). */
export async function deliverDue(limit = 20): Promise<number> {
  let sent = 0;
  await AppDataSource.transaction(async (m) => {
    const outbox = m.withRepository(OutboxRepository);
    const due = await outbox.claimDue(limit);
    for (const msg of due) {
      try {
        await transport().sendMail({ from: config.MAIL_FROM, to: msg.to, subject: msg.subject, text: msg.text });
        await outbox.markSent(msg);
        sent += 1;
      } catch (err) {
        const error = String((err as Error).message).slice(0, 500);
        await outbox.markFailed(msg, error, new Date(Date.now() + backoffMs(msg.attempts + 1)));
      }
    }
  });
  return sent;
}

let timer: ReturnType<typeof setInterval> | null = null;
let running = false;
export function startOutboxWorker(intervalMs = config.OUTBOX_POLL_MS) {
  if (timer) return;
  timer = setInterval(() => {
    if (running || !AppDataSource.isInitialized) return;
    running = true;
    deliverDue()
      .catch((err) => console.error('outbox:', (err as Error).message))
      .finally(() => {
        running = false;
      });
  }, intervalMs);
  (timer as unknown as { unref?: () => void }).unref?.();
}
export function stopOutboxWorker() {
  if (timer) clearInterval(timer);
  timer = null;
}
