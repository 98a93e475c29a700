/**
 * Local stand-in for an SMTP relay. Keeps every message it receives in memory and serves them
 * over a small HTTP API (GET /messages) so the admin mailbox page and tests can follow links.
 * POST /control {"accept": false} makes it refuse mail, to exercise outage handling.
 */
import { createServer, type Server } from 'node:http';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { CaughtMail } from '../shared/schemas/mailbox';
import { assertPortFree } from '../scripts/stack/ports';

export interface SmtpFake {
  smtpUrl: string;
  httpUrl: string;
  messages: CaughtMail[];
  stop(): Promise<void>;
}

const LINK = /https?:\/\/[^\s<>"')]+/g;

export async function startSmtpFake(opts: { smtpPort: number; httpPort: number }): Promise<SmtpFake> {
  await assertPortFree(opts.smtpPort, 'the SMTP fake (SMTP_PORT)');
  await assertPortFree(opts.httpPort, 'the mailbox of the SMTP fake (MAIL_FAKE_PORT)');
  const messages: CaughtMail[] = [];
  let accept = true;
  let counter = 0;

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, _session, callback) {
      if (!accept) {
        stream.resume();
        stream.on('end', () => callback(Object.assign(new Error('Mailbox unavailable (fake outage)'), { responseCode: 451 })));
        return;
      }
      simpleParser(stream)
        .then((mail) => {
          const to = Array.isArray(mail.to) ? mail.to : mail.to ? [mail.to] : [];
          const text = mail.text ?? '';
          messages.unshift({
            id: String(++counter),
            receivedAt: new Date().toISOString(),
            from: mail.from?.text ?? '',
            to: to.flatMap((a) => a.value.map((v) => v.address ?? '')),
            subject: mail.subject ?? '',
            text,
            links: [...new Set(text.match(LINK) ?? [])],
          });
          if (messages.length > 500) messages.length = 500;
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve) => smtp.listen(opts.smtpPort, '127.0.0.1', resolve));

  const http: Server = createServer((req, res) => {
    if (req.method === 'GET' && req.url === '/messages') {
      res.writeHead(200, { 'content-type': 'application/json' });
      res.end(JSON.stringify({ messages }));
    } else if (req.method === 'DELETE' && req.url === '/messages') {
      messages.length = 0;
      res.writeHead(204).end();
    } else if (req.method === 'POST' && req.url === '/control') {
      let body = '';
      req.on('data', (c: Buffer) => (body += c.toString()));
      req.on('end', () => {
        accept = (JSON.parse(body || '{}') as { accept?: boolean }).accept !== false;
        res.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify({ accept }));
      });
    } else {
      res.writeHead(404).end();
    }
  });
  await new Promise<void>((resolve) => http.listen(opts.httpPort, '127.0.0.1', resolve));

  return {
    smtpUrl: `smtp://127.0.0.1:${opts.smtpPort}`,
    httpUrl: `http://127.0.0.1:${opts.httpPort}`,
    messages,
    async stop() {
      await new Promise<void>((r) => http.close(() => r()));
      await new Promise<void>((r) => smtp.close(() => r()));
    },
  };
}
