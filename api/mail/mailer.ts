// Outgoing mail through nodemailer: SMTP when SMTP_URL is set (scripts/start points it at the local
// fake), otherwise messages are only written to the server log.
import nodemailer from 'nodemailer';
import type { Env } from '../config/env';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
}

export interface Mailer {
  send(message: MailMessage): Promise<void>;
}

export function createMailer(env: Env): Mailer {
  if (!env.SMTP_URL) {
    return {
      async send(m) {
        if (env.NODE_ENV !== 'test') console.log(`[lobewright] mail to ${m.to}: ${m.subject}`);
      },
    };
  }
  const transport = nodemailer.createTransport(env.SMTP_URL);
  return {
    async send(m) {
      await transport.sendMail({ from: env.MAIL_FROM, to: m.to, subject: m.subject, text: m.text });
    },
  };
}

/** Sends without letting a mail failure undo the work that triggered it. */
export async function sendQuietly(mailer: Mailer, message: MailMessage): Promise<void> {
  try {
    await mailer.send(message);
  } catch (err) {
    console.error(`[lobewright] could not send mail to ${message.to}:`, (err as Error).message);
  }
}

export function publicUrl(env: Env): string {
  return (env.PUBLIC_URL ?? `http://${env.HOST}:${env.PORT}`).replace(/\/$/, '');
}
