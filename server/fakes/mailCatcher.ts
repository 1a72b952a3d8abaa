/**
 * The local fake mail server for development and tests: an SMTP server on loopback that keeps
 * every message it receives in memory, so no real mail leaves the machine and tests (and a
 * developer, through `GET /api/dev/mail`) can read the links that were sent.
 */
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';

export interface CaughtMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}

export interface MailCatcher {
  port: number;
  /** Messages received so far, newest first; only those to `to` when given. */
  messages(to?: string): CaughtMail[];
  close(): Promise<void>;
}

/** Messages kept; older ones are dropped so a long-running dev server does not grow forever. */
const KEEP = 500;

export async function startMailCatcher(host = '127.0.0.1'): Promise<MailCatcher> {
  const inbox: CaughtMail[] = [];
  let nextId = 1;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          inbox.unshift({
            id: nextId++,
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            receivedAt: new Date().toISOString(),
          });
          inbox.length = Math.min(inbox.length, KEEP);
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, host, () => resolve());
  });
  server.on('error', () => {});
  const { port } = server.server.address() as AddressInfo;
  return {
    port,
    messages: (to) => (to ? inbox.filter((m) => m.to.includes(to.toLowerCase())) : [...inbox]),
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
