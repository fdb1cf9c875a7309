// A local SMTP server for the demo and the tests: it accepts every mail and keeps the last ones in
// memory for the dev inbox page. Never used when real SMTP settings are given.
import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { DevMail } from '../../../shared/schemas/team';

const KEEP = 200;
const LINK = /https?:\/\/[^\s<>"')]+/g;

export interface DevInbox {
  list(): DevMail[];
  /** Resolves with the first mail to `to` that arrives after the call. */
  waitFor(to: string, timeoutMs?: number): Promise<DevMail>;
  clear(): void;
}

export interface FakeSmtp {
  port: number;
  inbox: DevInbox;
  close(): Promise<void>;
}

export function extractLinks(text: string): string[] {
  return [...new Set((text.match(LINK) ?? []).map((link) => link.replace(/[.,;:!?]+$/, '')))];
}

export async function startFakeSmtp(port = 0, host = '127.0.0.1'): Promise<FakeSmtp> {
  const mails: DevMail[] = [];
  const waiters: { to: string; resolve: (m: DevMail) => void }[] = [];

  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    banner: 'Pitwall local mail catcher',
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const to = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
          const text = parsed.text ?? '';
          const mail: DevMail = {
            id: randomUUID(),
            from: parsed.from?.text ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
            to,
            subject: parsed.subject ?? '(no subject)',
            text,
            links: extractLinks(text),
            receivedAt: new Date().toISOString(),
          };
          mails.unshift(mail);
          mails.length = Math.min(mails.length, KEEP);
          for (const w of [...waiters]) {
            if (to.includes(w.to)) {
              waiters.splice(waiters.indexOf(w), 1);
              w.resolve(mail);
            }
          }
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  const address = server.server.address() as AddressInfo;

  const inbox: DevInbox = {
    list: () => [...mails],
    clear: () => {
      mails.length = 0;
    },
    waitFor(to, timeoutMs = 5000) {
      const wanted = to.toLowerCase();
      return new Promise((resolve, reject) => {
        const timer = setTimeout(() => reject(new Error(`no mail to ${to} within ${timeoutMs} ms`)), timeoutMs);
        waiters.push({
          to: wanted,
          resolve: (m) => {
            clearTimeout(timer);
            resolve(m);
          },
        });
      });
    },
  };

  return {
    port: address.port,
    inbox,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
