import { createServer, type Server } from 'node:https';
import type { AddressInfo } from 'node:net';
import { generate } from 'selfsigned';

/** One Web Push message as the stand-in received it (body still encrypted, base64). */
export interface ReceivedPush {
  seq: number;
  subscriptionId: string;
  receivedAtUtc: string;
  headers: Record<string, string | undefined>;
  /** aes128gcm record (RFC 8188) — the stand-in cannot read it; the subscriber's keys can. */
  bodyBase64: string;
}

export interface PushStandInOptions {
  /** 0 = any free port (kept across stop/start). */
  port?: number;
  /** Answer with this HTTP status instead of 201 for these subscription ids (e.g. 410). */
  host?: string;
}

const MAX_BODY_BYTES = 8192;

/**
 * A loopback stand-in for a Web Push service (RFC 8030): HTTPS with a self-signed certificate
 * for 127.0.0.1 (web-push always uses https.request — STACK gotcha 9). `POST /push/<id>` records
 * the message and answers 201; `GET /received` lists what arrived; `POST /gone/<id>` makes later
 * pushes to that subscription answer 410 Gone (as a real service does after an unsubscribe).
 */
export class PushStandIn {
  readonly received: ReceivedPush[] = [];
  private readonly gone = new Set<string>();
  private server: Server | undefined;
  private pems: { cert: string; key: string } | undefined;
  private port: number;
  private readonly host: string;
  private seq = 0;

  constructor(options: PushStandInOptions = {}) {
    this.port = options.port ?? 0;
    this.host = options.host ?? '127.0.0.1';
  }

  /** PEM of the self-signed certificate (to trust it in an https.Agent). */
  get certificatePem(): string {
    if (!this.pems) throw new Error('push stand-in not started yet');
    return this.pems.cert;
  }

  get running(): boolean {
    return this.server?.listening === true;
  }

  get baseUrl(): string {
    return `https://${this.host}:${this.port}`;
  }

  /** Endpoint to put in a subscription that this stand-in will accept. */
  endpointFor(subscriptionId: string): string {
    return `${this.baseUrl}/push/${encodeURIComponent(subscriptionId)}`;
  }

  markGone(subscriptionId: string): void {
    this.gone.add(subscriptionId);
  }

  async start(): Promise<void> {
    if (this.running) return;
    this.pems ??= await this.makeCertificate();
    const server = createServer({ key: this.pems.key, cert: this.pems.cert }, (req, res) => {
      const url = new URL(req.url ?? '/', this.baseUrl);
      const reply = (status: number, body?: unknown) => {
        res.writeHead(status, { 'content-type': 'application/json' });
        res.end(body === undefined ? '' : JSON.stringify(body));
      };
      if (req.method === 'GET' && url.pathname === '/received') {
        return reply(200, { items: this.received });
      }
      const gone = /^\/gone\/([^/]+)$/.exec(url.pathname);
      if (req.method === 'POST' && gone) {
        this.markGone(decodeURIComponent(gone[1]!));
        return reply(204);
      }
      const push = /^\/push\/([^/]+)$/.exec(url.pathname);
      if (req.method !== 'POST' || !push) return reply(404, { error: 'not found' });
      const subscriptionId = decodeURIComponent(push[1]!);
      const chunks: Buffer[] = [];
      let size = 0;
      req.on('data', (chunk: Buffer) => {
        size += chunk.length;
        if (size <= MAX_BODY_BYTES) chunks.push(chunk);
      });
      req.on('end', () => {
        if (size > MAX_BODY_BYTES) return reply(413, { error: 'payload too large' });
        if (this.gone.has(subscriptionId)) return reply(410, { error: 'subscription gone' });
        if (req.headers['content-encoding'] !== 'aes128gcm') {
          return reply(400, { error: 'content-encoding must be aes128gcm' });
        }
        this.received.push({
          seq: ++this.seq,
          subscriptionId,
          receivedAtUtc: new Date().toISOString(),
          headers: {
            'content-encoding': req.headers['content-encoding'],
            ttl: req.headers.ttl as string | undefined,
            urgency: req.headers.urgency as string | undefined,
            authorization: req.headers.authorization,
          },
          bodyBase64: Buffer.concat(chunks).toString('base64'),
        });
        res.writeHead(201, { location: `/messages/${this.seq}` });
        res.end();
      });
    });
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(this.port, this.host, () => {
        server.off('error', reject);
        resolve();
      });
    });
    this.port = (server.address() as AddressInfo).port;
    this.server = server;
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = undefined;
    if (!server) return;
    server.closeAllConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  private async makeCertificate(): Promise<{ cert: string; key: string }> {
    const now = Date.now();
    const pems = await generate([{ name: 'commonName', value: this.host }], {
      keyType: 'ec',
      curve: 'P-256',
      notBeforeDate: new Date(now - 86_400_000),
      notAfterDate: new Date(now + 365 * 86_400_000),
      extensions: [
        { name: 'basicConstraints', cA: false },
        { name: 'keyUsage', digitalSignature: true, keyEncipherment: true },
        { name: 'extKeyUsage', serverAuth: true },
        {
          name: 'subjectAltName',
          altNames: [
            { type: 7, ip: '127.0.0.1' },
            { type: 2, value: 'localhost' },
          ],
        },
      ],
    });
    return { cert: pems.cert, key: pems.private };
  }
}
