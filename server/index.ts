/** The server process: connect to MariaDB, then serve the app on config.PORT; drain on SIGTERM. */
import './heap';
import 'reflect-metadata';
import type { Server } from 'node:http';
import { config } from './config';
import { AppDataSource } from './db/data-source';
import { createApp } from './app';
import { drain } from './http/graceful';
import { lifecycle } from './http/lifecycle';
import { logger } from './http/logging';
import { fakeSmtp } from './modules/mail/fake-smtp';
import { startOutboxWorker, stopOutboxWorker } from './modules/mail/mailer';
import { startImportCleanup, stopImportCleanup } from './modules/imports/import-cleanup';
import { searchEngine } from './modules/search/search.service';

let server: Server | undefined;
let stopping = false;

async function shutdown(code: number, why: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ why }, 'draining: no new connections, finishing requests in flight');
  // A last resort if closing itself hangs (a pool that cannot end).
  const force = setTimeout(() => process.exit(code || 1), config.SHUTDOWN_TIMEOUT_MS + 5000) as unknown as {
    unref(): void;
  };
  force.unref();
  const clean = await drain({
    server,
    timeoutMs: config.SHUTDOWN_TIMEOUT_MS,
    stopWork: async () => {
      await stopOutboxWorker();
      stopImportCleanup();
      await fakeSmtp.stop();
    },
    close: () => (AppDataSource.isInitialized ? AppDataSource.destroy() : Promise.resolve()),
  });
  logger.info({ clean }, clean ? 'stopped' : 'stopped; requests still running were cut off');
  logger.flush?.();
  process.exit(code);
}

process.on('unhandledRejection', (reason) => {
  logger.fatal({ err: reason }, 'unhandled rejection');
  void shutdown(1, 'unhandled rejection');
});
process.on('uncaughtException', (err) => {
  logger.fatal({ err }, 'uncaught exception');
  void shutdown(1, 'uncaught exception');
});
process.on('SIGINT', () => void shutdown(0, 'SIGINT'));
process.on('SIGTERM', () => void shutdown(0, 'SIGTERM'));

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
    lifecycle.markReady();
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
