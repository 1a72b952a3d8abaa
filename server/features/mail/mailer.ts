/**
 * Outgoing e-mail through nodemailer's SMTP transport: the real relay in production, the local
 * mail catcher in development and tests.
 */
import nodemailer from 'nodemailer';
import { HttpError } from '../../http/HttpError.ts';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

export function createSmtpMailer(smtp: { host: string; port: number; from: string }): Mailer {
  if (smtp.port === 0) {
    return {
      send: async () => {
        throw new HttpError(503, 'mail_unavailable', 'No mail server is configured (set SMTP_HOST and SMTP_PORT).');
      },
    };
  }
  const transport = nodemailer.createTransport({
    host: smtp.host,
    port: smtp.port,
    secure: false,
    // The loopback catcher speaks plain SMTP; a real relay on 587 upgrades with STARTTLS.
    ignoreTLS: smtp.host === '127.0.0.1' || smtp.host === 'localhost',
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: smtp.from, to: mail.to, subject: mail.subject, text: mail.text });
    },
  };
}
