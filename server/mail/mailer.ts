import nodemailer from 'nodemailer';
import type { Env } from '../config/env';

export type OutgoingMail = { to: string[]; subject: string; text: string; html?: string };

export type Mailer = {
  send(mail: OutgoingMail): Promise<void>;
  /** Opens an SMTP session and says hello: proves the relay (or catcher) answers. */
  verify(): Promise<boolean>;
  close(): void;
};

/** nodemailer over SMTP: the local catcher in development, any relay by configuration. */
export function createMailer(env: Env): Mailer {
  const transport = nodemailer.createTransport({
    host: env.smtp.host,
    port: env.smtp.port,
    secure: false,
    ignoreTLS: env.mailCatcher,
    connectionTimeout: 3000,
    greetingTimeout: 3000,
    ...(env.smtp.user ? { auth: { user: env.smtp.user, pass: env.smtp.pass ?? '' } } : {}),
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: env.mailFrom, ...mail });
    },
    verify: () => transport.verify(),
    close: () => transport.close(),
  };
}
