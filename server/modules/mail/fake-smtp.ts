/**
 * The local stand-in for a mail server (development and tests): a real SMTP server
 * on 127.0.0.1 that accepts every message and keeps it in memory for the
 * development mailbox page.
 */
import { SMTPServer } from 'smtp-server';
import { simpleParse, type KeptMessage } from './parse-message';

export class FakeSmtpServer {
  readonly messages: KeptMessage[] = [];
  private server: SMTPServer | null = null;
  port = 0;

  async start(port: number): Promise<number> {
    if (this.server) return this.port;
    const server = new SMTPServer({
      secure: false,
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      logger: false,
      onData: (stream, _session, callback) => {
        const chunks: Buffer[] = [];
        stream.on('data', (c: Buffer) => chunks.push(c));
        stream.on('end', () => {
          this.messages.unshift(simpleParse(Buffer.concat(chunks).toString('utf8'), this.messages.length + 1));
          callback();
        });
      },
    });
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, '127.0.0.1', () => resolve());
    });
    this.server = server;
    this.port = (server.server.address() as { port: number }).port;
    return this.port;
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = null;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  get running() {
    return this.server !== null;
  }
}

export const fakeSmtp = new FakeSmtpServer();
