import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface CapturedMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

export interface CaptureServer {
  port: number;
  url: string;
  messages: CapturedMail[];
  close(): Promise<void>;
}

/**
 * A real SMTP server on loopback that keeps what it receives, for development and tests: mail is sent through
 * nodemailer exactly as in production and can be read back here (and from dir, for the dev inbox page).
 */
export async function startCaptureServer(options: { port?: number; dir?: string | null } = {}): Promise<CaptureServer> {
  const messages: CapturedMail[] = [];
  if (options.dir) mkdirSync(options.dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Coldknit mail capture',
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const mail: CapturedMail = {
            id: `${Date.now()}-${messages.length + 1}`,
            receivedAt: new Date().toISOString(),
            from: parsed.from?.text ?? '',
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
          };
          messages.push(mail);
          if (options.dir) writeFileSync(join(options.dir, `${mail.id}.json`), JSON.stringify(mail));
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, '127.0.0.1', () => resolve());
  });
  const port = (server.server.address() as AddressInfo).port;
  return {
    port,
    url: `smtp://127.0.0.1:${port}`,
    messages,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
