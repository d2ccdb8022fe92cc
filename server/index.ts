/** The server process: connect to MariaDB, then serve the app on config.PORT. */
import 'reflect-metadata';
import type { Server } from 'node:http';
import { config } from './config';
import { AppDataSource } from './db/data-source';
import { createApp } from './app';
import { fakeSmtp } from './modules/mail/fake-smtp';
import { startOutboxWorker, stopOutboxWorker } from './modules/mail/mailer';
import { startImportCleanup, stopImportCleanup } from './modules/imports/import-cleanup';
import { searchEngine } from './modules/search/search.service';

let server: Server | undefined;

function shutdown(code: number) {
  stopOutboxWorker();
  stopImportCleanup();
  void fakeSmtp.stop();
  const done = () =>
    AppDataSource.destroy()
      .catch(() => undefined)
      .finally(() => process.exit(code));
  if (server) server.close(done);
  else done();
  const force = setTimeout(() => process.exit(code), 5000) as unknown as { unref(): void };
  force.unref();
}

process.on('unhandledRejection', (reason) => {
  console.error('Unhandled rejection:', reason);
  shutdown(1);
});
process.on('uncaughtException', (err) => {
  console.error('Uncaught exception:', err);
  shutdown(1);
});
process.on('SIGINT', () => shutdown(0));
process.on('SIGTERM', () => shutdown(0));

async function main() {
  await AppDataSource.initialize();
  if (!config.SMTP_URL && config.NODE_ENV !== 'production') {
    const port = await fakeSmtp.start(config.FAKE_SMTP_PORT);
    console.log(
      `Local mail server on 127.0.0.1:${port}. Development only: its messages (sign-up and password-reset links)`,
    );
    console.log(
      `are shown at http://localhost:${config.PORT}/dev/mailbox to this machine alone; set SMTP_URL for real mail.`,
    );
  }
  startOutboxWorker();
  startImportCleanup();
  // Build the search index now, not on the first search.
  void searchEngine.rebuild().catch((err) => console.error('Search index build failed:', err));
  server = createApp().listen(config.PORT, config.HOST, () => {
    const where =
      config.HOST === '127.0.0.1' ? `http://localhost:${config.PORT}` : `http://${config.HOST}:${config.PORT}`;
    console.log(
      `Specbench is running at ${where}  (listening on ${config.HOST}; set HOST to open it up; API under /api, Ctrl-C stops it)`,
    );
  });
}

main().catch((err) => {
  console.error('Specbench could not start:', err);
  process.exit(1);
});
