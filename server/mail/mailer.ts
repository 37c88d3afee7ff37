// Outgoing e-mail through nodemailer over SMTP: the local fake server in development, demo and
// tests, or the real server named by SMTP_URL.
import nodemailer from 'nodemailer';

export type Mail = { to: string | string[]; subject: string; text: string; html?: string };

export type Mailer = { send: (mail: Mail) => Promise<void>; close: () => void };

export type SmtpTarget = { url: string } | { host: string; port: number };

export function createMailer(target: SmtpTarget, from: string): Mailer {
  const transport =
    'url' in target
      ? nodemailer.createTransport(target.url)
      : nodemailer.createTransport({ host: target.host, port: target.port, secure: false, ignoreTLS: true });
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
    close: () => transport.close(),
  };
}
