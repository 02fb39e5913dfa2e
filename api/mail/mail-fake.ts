// A local SMTP fake for development and tests (smtp-server): accepts every message on loopback and
// keeps it, parsed, in memory and optionally as .eml files in a folder.
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface CaughtMail {
  to: string[];
  subject: string;
  text: string;
}

export interface MailFake {
  url: string;
  messages: CaughtMail[];
  stop(): Promise<void>;
}

export async function startMailFake(options: { port?: number; folder?: string } = {}): Promise<MailFake> {
  const messages: CaughtMail[] = [];
  if (options.folder) mkdirSync(options.folder, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        const raw = Buffer.concat(chunks);
        simpleParser(raw)
          .then((mail) => {
            const to = (Array.isArray(mail.to) ? mail.to : mail.to ? [mail.to] : []).flatMap((a) =>
              a.value.map((v) => v.address ?? ''),
            );
            messages.push({ to, subject: mail.subject ?? '', text: mail.text ?? '' });
            if (options.folder) {
              writeFileSync(path.join(options.folder, `${Date.now()}-${messages.length}.eml`), raw);
            }
            callback();
          })
          .catch(callback);
      });
    },
  });
  await new Promise<void>((resolve) => server.listen(options.port ?? 0, '127.0.0.1', resolve));
  const { port } = server.server.address() as AddressInfo;
  return {
    url: `smtp://127.0.0.1:${port}`,
    messages,
    stop: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
