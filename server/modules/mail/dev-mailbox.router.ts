/**
 * Development only (never mounted when NODE_ENV=production): the messages the local
 * fake SMTP server received, so a new account can be verified without a mail service.
 * The messages hold sign-up and password-reset links, so the page answers only a browser
 * on this machine: the socket's own peer address must be loopback (X-Forwarded-For and
 * the like are never believed), and a proxied request is refused outright.
 */
import { Router, type NextFunction, type Request, type Response } from 'express';
import { AppError } from '@/server/errors/app-error';
import { route } from '@/server/http/handler';
import { fakeSmtp } from './fake-smtp';

const LOOPBACK = /^(127\.\d{1,3}\.\d{1,3}\.\d{1,3}|::1|::ffff:127\.\d{1,3}\.\d{1,3}\.\d{1,3})$/;

/** True for a direct connection from this machine (the TCP peer, not what headers claim). */
export function isDirectLoopbackPeer(req: Pick<Request, 'socket' | 'headers'>): boolean {
  const peer = req.socket.remoteAddress ?? '';
  const proxied = ['forwarded', 'x-forwarded-for', 'x-real-ip'].some((h) => req.headers[h] !== undefined);
  return LOOPBACK.test(peer) && !proxied;
}

function loopbackOnly(req: Request, _res: Response, next: NextFunction) {
  // 404, not 403: to anyone else the page does not exist.
  if (!isDirectLoopbackPeer(req)) throw AppError.notFound('page');
  next();
}

const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
const linkify = (s: string) => escape(s).replace(/(https?:\/\/[^\s<]+)/g, '<a href="$1">$1</a>');

export const devMailboxRouter = Router();
devMailboxRouter.use(loopbackOnly);

function mailboxPage(): string {
  const items = fakeSmtp.messages
    .map(
      (m) => `
    <article data-testid="mail-${m.id}">
      <h2>${escape(m.subject)}</h2>
      <p class="meta">To ${escape(m.to)} · ${escape(m.receivedAt)}</p>
      <pre>${linkify(m.text)}</pre>
    </article>`,
    )
    .join('');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1"><title>Specbench development mailbox</title>
<style>body{font-family:system-ui,sans-serif;max-width:760px;margin:0 auto;padding:16px;background:#f6f7f9;color:#17202a}
article{background:#fff;border:1px solid #d5dae1;border-radius:12px;padding:12px 16px;margin:12px 0}
h1{font-size:22px}h2{font-size:17px;margin:0 0 4px}.meta{color:#55606e;font-size:13px;margin:0 0 8px}
pre{white-space:pre-wrap;font-family:inherit;font-size:15px}a{color:#1f4e79;word-break:break-all}</style></head>
<body><h1>Development mailbox</h1><p>Messages caught by the local mail server (${fakeSmtp.messages.length}). Development only: shown to this machine alone, never in production.</p>
${items || '<p>No messages yet.</p>'}</body></html>`;
}

const mailboxJson = route({}, () => fakeSmtp.messages);
const mailbox = route({}, ({ res }) => {
  res.type('html').send(mailboxPage());
});

devMailboxRouter.get('/mailbox.json', mailboxJson);
devMailboxRouter.get('/mailbox', mailbox);
