import { createServer, type Server } from 'node:http';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';

export interface ReceivedMail {
  id: number;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

export interface MailSink {
  smtpPort: number;
  httpPort: number;
  inbox: ReceivedMail[];
  close(): Promise<void>;
}

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/**
 * The local mail sink for development and tests: an SMTP server that keeps every
 * message it receives, and a small HTTP inbox (`/` as a page, `/messages` as JSON).
 * It never relays anything anywhere.
 */
export async function startMailSink(opts: { smtpPort?: number; httpPort?: number; host?: string } = {}): Promise<MailSink> {
  const host = opts.host ?? '127.0.0.1';
  const inbox: ReceivedMail[] = [];
  let nextId = 1;
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((m) => {
          inbox.push({
            id: nextId++,
            receivedAt: new Date().toISOString(),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: m.subject ?? '',
            text: m.text ?? '',
            html: typeof m.html === 'string' ? m.html : '',
          });
          callback();
        })
        .catch(callback);
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(opts.smtpPort ?? 0, host, () => resolve());
  });
  const http: Server = createServer((req, res) => {
    if (req.url?.startsWith('/messages')) {
      res.writeHead(200, { 'content-type': 'application/json' });
      res.end(JSON.stringify(inbox));
      return;
    }
    const rows = [...inbox]
      .reverse()
      .map(
        (m) =>
          `<article style="background:#fff;border:1px solid #E3DED4;border-radius:6px;padding:12px;margin:12px 0"><p style="color:#5B6270;margin:0">#${m.id} · ${esc(m.receivedAt)} · to ${esc(m.to.join(', '))}</p><h2 style="font-size:16px">${esc(m.subject)}</h2><pre style="white-space:pre-wrap">${esc(m.text)}</pre></article>`,
      )
      .join('');
    res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
    res.end(
      `<!doctype html><title>Farthing dev inbox</title><body style="background:#F7F4EE;color:#1E2430;font-family:sans-serif;max-width:760px;margin:auto;padding:24px"><h1>Dev inbox</h1><p>Every e-mail the app sent in development. Nothing here leaves this machine.</p>${rows || '<p>No mail yet.</p>'}</body>`,
    );
  });
  await new Promise<void>((resolve, reject) => {
    http.once('error', reject);
    http.listen(opts.httpPort ?? 0, host, () => resolve());
  });
  return {
    smtpPort: (smtp.server.address() as AddressInfo).port,
    httpPort: (http.address() as AddressInfo).port,
    inbox,
    close: () =>
      new Promise<void>((resolve) => {
        http.close();
        http.closeAllConnections();
        smtp.close(() => resolve());
      }),
  };
}
