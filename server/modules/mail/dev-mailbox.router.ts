/**
 * Development only (never mounted when NODE_ENV=production): the messages the local
 * fake SMTP server received, so a new account can be verified without a mail service.
 */
import { Router } from 'express';
import { fakeSmtp } from './fake-smtp';

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
const linkify = (s: string) => escape(s).replace(/(https?:\/\/[^\s<]+)/g, '<a href="$1">$1</a>');

export const devMailboxRouter = Router();

devMailboxRouter.get('/mailbox.json', (_req, res) => {
  res.json(fakeSmtp.messages);
});

devMailboxRouter.get('/mailbox', (_req, res) => {
  const items = fakeSmtp.messages.map((m) => `
    <article data-testid="mail-${m.id}">
      <h2>${escape(m.subject)}</h2>
      <p class="meta">To ${escape(m.to)} · ${escape(m.receivedAt)}</p>
      <pre>${linkify(m.text)}</pre>
    </article>`).join('');
  res.type('html').send(`<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1"><title>Specbench development mailbox</title>
<style>body{font-family:system-ui,sans-serif;max-width:760px;margin:0 auto;padding:16px;background:#f6f7f9;color:#17202a}
article{background:#fff;border:1px solid #d5dae1;border-radius:12px;padding:12px 16px;margin:12px 0}
h1{font-size:22px}h2{font-size:17px;margin:0 0 4px}.meta{color:#55606e;font-size:13px;margin:0 0 8px}
pre{white-space:pre-wrap;font-family:inherit;font-size:15px}a{color:#1f4e79;word-break:break-all}</style></head>
<body><h1>Development mailbox</h1><p>Messages caught by the local mail server (${fakeSmtp.messages.length}). Not available in production.</p>
${items || '<p>No messages yet.</p>'}</body></html>`);
});
