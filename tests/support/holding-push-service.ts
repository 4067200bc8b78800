// A Web Push service (RFC 8030) for fault tests, run in the test process so that it outlives the
// product: HTTPS on 127.0.0.1 with a self-signed certificate (the product trusts it through
// NODE_EXTRA_CA_CERTS, as it would trust a private CA). `POST /push/<label>` records the message;
// the first `ackLimit` messages are acknowledged (201), every later one is recorded and then left
// unanswered, so the sender is stuck between "the service has it" and "the service said so".
import { createServer, type Server } from 'node:https';
import type { AddressInfo } from 'node:net';
import { generate } from 'selfsigned';

export interface PushMessage {
  label: string;
  /** aes128gcm body (RFC 8188), readable with the subscriber's keys. */
  body: Buffer;
  acknowledged: boolean;
}

export class HoldingPushService {
  readonly received: PushMessage[] = [];
  /** Acknowledge this many messages, then hold every later one unanswered. */
  ackLimit = Number.POSITIVE_INFINITY;
  caPem = '';
  private server: Server | undefined;
  private port = 0;
  private acknowledged = 0;
  private heldWaiters: (() => void)[] = [];

  endpointFor(label: string): string {
    return `https://127.0.0.1:${this.port}/push/${encodeURIComponent(label)}`;
  }

  /** Resolves once a message is being held. */
  held(): Promise<void> {
    if (this.received.some((m) => !m.acknowledged)) return Promise.resolve();
    return new Promise((resolve) => this.heldWaiters.push(resolve));
  }

  async start(): Promise<void> {
    const now = Date.now();
    const pems = await generate([{ name: 'commonName', value: '127.0.0.1' }], {
      keyType: 'ec',
      curve: 'P-256',
      notBeforeDate: new Date(now - 86_400_000),
      notAfterDate: new Date(now + 86_400_000),
      extensions: [
        { name: 'basicConstraints', cA: false },
        { name: 'keyUsage', digitalSignature: true, keyEncipherment: true },
        { name: 'extKeyUsage', serverAuth: true },
        { name: 'subjectAltName', altNames: [{ type: 7, ip: '127.0.0.1' }] },
      ],
    });
    this.caPem = pems.cert;
    const server = createServer({ key: pems.private, cert: pems.cert }, (req, res) => {
      const match = /^\/push\/([^/?]+)$/.exec(req.url ?? '');
      if (req.method !== 'POST' || !match) {
        res.writeHead(404).end();
        return;
      }
      const chunks: Buffer[] = [];
      req.on('data', (c: Buffer) => chunks.push(c));
      req.on('end', () => {
        const acknowledged = this.acknowledged < this.ackLimit;
        const label = decodeURIComponent(match[1]!);
        this.received.push({ label, body: Buffer.concat(chunks), acknowledged });
        if (!acknowledged) {
          for (const wake of this.heldWaiters.splice(0)) wake();
          return; // no answer: the sender waits (until it dies)
        }
        this.acknowledged++;
        res.writeHead(201, { location: `/messages/${this.received.length}` }).end();
      });
    });
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(0, '127.0.0.1', () => resolve());
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
}
