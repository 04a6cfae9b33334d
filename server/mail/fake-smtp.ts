import { mkdirSync, writeFileSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/** One message the fake caught, parsed. */
export interface CaughtMail {
  id: string;
  from: string;
  to: string[];
  subject: string;
  /** The Reply-To header as written ("Name <address>"), or null. */
  replyTo: string | null;
  text: string;
  html: string | null;
  attachments: { filename: string; contentType: string; size: number; content: Buffer }[];
  receivedAt: string;
  /** Where the raw message was written, when a folder was given. */
  emlPath: string | null;
}

export interface FakeSmtpOptions {
  /** 0 or absent: any free port. */
  port?: number;
  host?: string;
  /** Folder for one .eml file per message. */
  dir?: string;
  /** Also list caught mail as JSON on loopback: GET / and GET /<id>.eml. 0 picks a free port. */
  httpPort?: number;
  /**
   * Recipients to hang on: RCPT TO for an address this matches is not answered (until release()),
   * as from a mail server that stops responding mid-conversation, so the sender stays stuck in
   * that send.
   */
  stall?: (recipient: string) => boolean;
}

export interface FakeSmtp {
  port: number;
  /** Port of the JSON listing, when one was asked for. */
  httpPort: number | null;
  messages(): CaughtMail[];
  /** Recipients whose RCPT TO it is hanging on (or was), in order. */
  stalled(): string[];
  /** Answers every RCPT TO it is hanging on with a temporary failure (451), failing those sends. */
  release(): void;
  /** Resolves with the first caught message matching, or rejects after timeoutMs. */
  waitFor(match: (mail: CaughtMail) => boolean, timeoutMs?: number): Promise<CaughtMail>;
  stop(): Promise<void>;
}

/**
 * A local SMTP catcher for development and tests: accepts every message without auth, keeps it
 * in memory and, with `dir`, writes it as .eml so caught mail can be opened locally.
 */
export async function startFakeSmtp(options: FakeSmtpOptions = {}): Promise<FakeSmtp> {
  const host = options.host ?? '127.0.0.1';
  const caught: CaughtMail[] = [];
  const raws = new Map<string, Buffer>();
  const stalled: string[] = [];
  const hanging: ((error: Error & { responseCode?: number }) => void)[] = [];
  const waiters = new Set<() => void>();
  if (options.dir) mkdirSync(options.dir, { recursive: true });

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onRcptTo(address, _session, callback) {
      if (!options.stall?.(address.address)) return callback();
      stalled.push(address.address);
      hanging.push(callback);
    },
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', callback);
      stream.on('end', () => {
        const raw = Buffer.concat(chunks);
        simpleParser(raw).then(
          (parsed) => {
            const id = `${Date.now().toString(36)}-${caught.length + 1}`;
            let emlPath: string | null = null;
            if (options.dir) {
              emlPath = join(options.dir, `${id}.eml`);
              writeFileSync(emlPath, raw);
            }
            raws.set(id, raw);
            caught.push({
              id,
              from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
              to: session.envelope.rcptTo.map((r) => r.address),
              subject: parsed.subject ?? '',
              replyTo: parsed.replyTo?.text ?? null,
              text: parsed.text ?? '',
              html: typeof parsed.html === 'string' ? parsed.html : null,
              attachments: parsed.attachments.map((a) => ({
                filename: a.filename ?? '',
                contentType: a.contentType,
                size: a.size,
                content: a.content,
              })),
              receivedAt: new Date().toISOString(),
              emlPath,
            });
            for (const wake of waiters) wake();
            callback();
          },
          (error: Error) => callback(error),
        );
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(options.port ?? 0, host, () => resolve());
  });
  const port = (smtp.server.address() as AddressInfo).port;

  let http: Server | null = null;
  if (options.httpPort !== undefined) {
    http = createServer((req, res) => {
      const eml = /^\/([\w-]+)\.eml$/.exec(req.url ?? '');
      if (eml && raws.has(eml[1])) {
        res.writeHead(200, { 'content-type': 'message/rfc822' }).end(raws.get(eml[1]));
        return;
      }
      const list = caught.map(({ attachments, ...rest }) => ({
        ...rest,
        attachments: attachments.map(({ content: _content, ...meta }) => meta),
      }));
      res.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify(list));
    });
    await new Promise<void>((resolve) => http!.listen(options.httpPort, '127.0.0.1', () => resolve()));
  }

  return {
    port,
    httpPort: http ? (http.address() as AddressInfo).port : null,
    messages: () => [...caught],
    stalled: () => [...stalled],
    release() {
      for (const answer of hanging.splice(0))
        answer(Object.assign(new Error('Try again later'), { responseCode: 451 }));
    },
    waitFor(match, timeoutMs = 10_000) {
      return new Promise((resolve, reject) => {
        const check = () => {
          const found = caught.find(match);
          if (!found) return false;
          cleanup();
          resolve(found);
          return true;
        };
        const timer = setTimeout(() => {
          cleanup();
          reject(new Error(`No matching mail within ${timeoutMs} ms (caught ${caught.length}).`));
        }, timeoutMs);
        const cleanup = () => {
          clearTimeout(timer);
          waiters.delete(check);
        };
        if (!check()) waiters.add(check);
      });
    },
    async stop() {
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
      if (http) await new Promise<void>((resolve) => http!.close(() => resolve()));
    },
  };
}
