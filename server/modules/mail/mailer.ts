/**
 * Outgoing mail. Services enqueue() inside their own transaction, so a message exists
 * exactly when the change that caused it was committed; the outbox worker sends it
 * with retries and back-off, so a mail outage delays messages and loses none.
 *
 * Sending never happens inside a database transaction: a batch is claimed (leased) and
 * committed first, each message is sent with a short bound, then its result is recorded.
 * A mail server that accepts connections and never answers costs one bound per batch,
 * not a transaction held open for minutes.
 */
import nodemailer, { type Transporter } from 'nodemailer';
import type { EntityManager } from 'typeorm';
import { config } from '@/server/config';
import { AppDataSource } from '@/server/db/data-source';
import { within } from '@/server/http/lifecycle';
import { logger } from '@/server/http/logging';
import { fakeSmtp } from './fake-smtp';
import { subjectLine } from './subject';
import type { OutboxMessage } from './outbox-message.entity';
import { OutboxRepository, type Mail } from './outbox.repository';

export type { Mail };

export async function enqueue(m: EntityManager, mail: Mail): Promise<void> {
  await m.withRepository(OutboxRepository).enqueue({ ...mail, subject: subjectLine(mail.subject) });
}

/** Per-message bounds (common practice, no published source): connect, greeting, whole send. */
export const SMTP_TIMEOUTS = { connectionTimeout: 3000, greetingTimeout: 3000, socketTimeout: 5000 };
export const SEND_TIMEOUT_MS = 8000;
const BATCH = 10;
/** A claimed batch is this worker's for longer than the batch can take. */
export const LEASE_MS = BATCH * SEND_TIMEOUT_MS + 30_000;

let transporter: Transporter | null = null;
function transport(): Transporter {
  transporter ??= config.SMTP_URL
    ? nodemailer.createTransport({ url: config.SMTP_URL, ...SMTP_TIMEOUTS })
    : nodemailer.createTransport({
        host: '127.0.0.1',
        port: fakeSmtp.port || config.FAKE_SMTP_PORT,
        secure: false,
        ignoreTLS: true,
        ...SMTP_TIMEOUTS,
      });
  return transporter;
}
export function resetTransport() {
  transporter?.close();
  transporter = null;
}

/** 2 s, 4 s, 8 s … capped at 10 minutes. */
export const backoffMs = (attempts: number) => Math.min(600_000, 1000 * 2 ** attempts);

/** The server could not be reached at all: the rest of the batch would fail the same way. */
const UNREACHABLE = /ECONNREFUSED|ETIMEDOUT|ECONNECTION|ESOCKET|EDNS|no answer within|Greeting never received/i;

/** Sends what is due; returns how many went. Safe to run from several processes. */
export async function deliverDue(limit = BATCH): Promise<number> {
  const claimed = await OutboxRepository.claimDue(limit, LEASE_MS);
  let sent = 0;
  let unreachable: string | null = null;
  for (const msg of claimed) {
    const error: string | null = unreachable ?? (await send(msg));
    if (error === null) {
      await OutboxRepository.markSent(msg);
      sent += 1;
    } else {
      if (UNREACHABLE.test(error)) unreachable ??= error;
      await OutboxRepository.markFailed(msg, error, new Date(Date.now() + backoffMs(msg.attempts)));
    }
  }
  return sent;
}

/** null when the server took the message; the error's text otherwise. */
async function send(msg: OutboxMessage): Promise<string | null> {
  try {
    const mail = { from: config.MAIL_FROM, to: msg.to, subject: msg.subject, text: msg.text };
    await within(SEND_TIMEOUT_MS, transport().sendMail(mail));
    return null;
  } catch (err) {
    return String((err as Error).message).slice(0, 500);
  }
}

let timer: ReturnType<typeof setInterval> | null = null;
let current: Promise<unknown> | null = null;
export function startOutboxWorker(intervalMs = config.OUTBOX_POLL_MS) {
  if (timer) return;
  timer = setInterval(() => {
    if (current || !AppDataSource.isInitialized) return;
    current = deliverDue()
      .catch((err) => logger.warn({ err }, 'outbox: delivery run failed'))
      .finally(() => {
        current = null;
      });
  }, intervalMs);
  (timer as unknown as { unref?: () => void }).unref?.();
}
/** Stops polling; resolves once the batch being sent (if any) is recorded. */
export async function stopOutboxWorker(): Promise<void> {
  if (timer) clearInterval(timer);
  timer = null;
  await current;
}
