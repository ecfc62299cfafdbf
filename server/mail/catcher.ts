import { createServer, type Server as HttpServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { OutboxMessage } from '../../shared/schemas/outbox';

/**
 * The local mail catcher: a real SMTP server on loopback that keeps what it receives, and a small
 * HTTP view of those messages (GET /messages) that the Outbox reads. Used whenever SMTP_URL is unset.
 */
export interface MailCatcher {
  smtpUrl: string;
  httpUrl: string;
  messages: OutboxMessage[];
  close(): Promise<void>;
}

const MAX_KEPT = 500;

function addressText(a: AddressObject | AddressObject[] | undefined): string {
  if (!a) return '';
  return (Array.isArray(a) ? a : [a]).map((x) => x.text).join(', ');
}

export async function startMailCatcher(opts: { smtpPort?: number; httpPort?: number } = {}): Promise<MailCatcher> {
  const messages: OutboxMessage[] = [];
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          messages.unshift({
            to: addressText(mail.to),
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : '',
            date: (mail.date ?? new Date()).toISOString(),
          });
          messages.length = Math.min(messages.length, MAX_KEPT);
          callback();
        })
        .catch((err: unknown) => callback(err instanceof Error ? err : new Error(String(err))));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(opts.smtpPort ?? 0, '127.0.0.1', () => resolve());
  });
  const smtpPort = (smtp.server.address() as AddressInfo).port;

  const http: HttpServer = createServer((req, res) => {
    if (req.method === 'GET' && req.url === '/messages') {
      res.writeHead(200, { 'content-type': 'application/json' });
      res.end(JSON.stringify({ messages }));
      return;
    }
    if (req.method === 'DELETE' && req.url === '/messages') {
      messages.length = 0;
      res.writeHead(204).end();
      return;
    }
    res.writeHead(404).end();
  });
  await new Promise<void>((resolve) => http.listen(opts.httpPort ?? 0, '127.0.0.1', () => resolve()));
  const httpPort = (http.address() as AddressInfo).port;

  return {
    smtpUrl: `smtp://127.0.0.1:${smtpPort}`,
    httpUrl: `http://127.0.0.1:${httpPort}`,
    messages,
    async close() {
      await new Promise<void>((resolve) => http.close(() => resolve()));
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
    },
  };
}
