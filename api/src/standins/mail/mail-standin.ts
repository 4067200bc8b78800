import type { AddressInfo } from 'node:net';
import type { SMTPServer as SmtpServerType } from 'smtp-server';

/** One message as the stand-in received it. */
export interface ReceivedMail {
  seq: number;
  receivedAtUtc: string;
  from: string | undefined;
  to: string[];
  subject: string | undefined;
  /** The whole RFC 5322 message as sent. */
  raw: string;
}

/** Unfolds RFC 5322 header lines and returns the value of `name` (first occurrence), decoded. */
export function headerOf(raw: string, name: string): string | undefined {
  const head = raw.split(/\r?\n\r?\n/, 1)[0] ?? '';
  const unfolded = head.replace(/\r?\n[ \t]+/g, ' ');
  const re = new RegExp(`^${name}:[ \\t]*(.*)$`, 'im');
  const value = re.exec(unfolded)?.[1]?.trim();
  return value === undefined ? undefined : decodeEncodedWords(value);
}

/**
 * RFC 2047 encoded words (`=?UTF-8?Q?...?=`, `=?UTF-8?B?...?=`); whitespace between two
 * adjacent encoded words is dropped (RFC 2047 §6.2).
 */
export function decodeEncodedWords(value: string): string {
  const word = /=\?([^?]+)\?([QqBb])\?([^?]*)\?=/g;
  return value
    .replace(/(\?=)\s+(=\?)/g, '$1$2')
    .replace(word, (_m, _charset, enc: string, text: string) => {
      if (enc.toUpperCase() === 'B') return Buffer.from(text, 'base64').toString('utf8');
      const bytes = text
        .replace(/_/g, ' ')
        .replace(/=([0-9A-Fa-f]{2})/g, (_x, hex: string) => String.fromCharCode(parseInt(hex, 16)));
      return Buffer.from(bytes, 'latin1').toString('utf8');
    });
}

/**
 * A loopback mail server that records what it receives, built on `smtp-server`
 * (STACK gotcha 10: no auth required, STARTTLS disabled; the sender uses secure: false,
 * ignoreTLS: true). Stop and start keep the port, so a test can take it down and bring it back.
 */
export class MailStandIn {
  readonly received: ReceivedMail[] = [];
  private server: SmtpServerType | undefined;
  private port: number;
  private readonly host = '127.0.0.1';
  private seq = 0;

  constructor(options: { port?: number } = {}) {
    this.port = options.port ?? 0;
  }

  get running(): boolean {
    return this.server !== undefined;
  }

  get url(): string {
    return `smtp://${this.host}:${this.port}`;
  }

  async start(): Promise<void> {
    if (this.server) return;
    // Loaded on demand: smtp-server is only needed where the stand-in runs (development, tests).
    const { SMTPServer } = await import('smtp-server');
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      banner: 'Hopwise mail stand-in',
      size: 1_000_000,
      onData: (stream, session, callback) => {
        const chunks: Buffer[] = [];
        stream.on('data', (chunk: Buffer) => chunks.push(chunk));
        stream.on('end', () => {
          const raw = Buffer.concat(chunks).toString('utf8');
          const from = session.envelope.mailFrom;
          this.received.push({
            seq: ++this.seq,
            receivedAtUtc: new Date().toISOString(),
            from: from ? from.address : undefined,
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: headerOf(raw, 'Subject'),
            raw,
          });
          callback();
        });
      },
    });
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(this.port, this.host, () => {
        server.off('error', reject);
        resolve();
      });
    });
    this.port = (server.server.address() as AddressInfo).port;
    this.server = server;
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = undefined;
    if (!server) return;
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }
}
