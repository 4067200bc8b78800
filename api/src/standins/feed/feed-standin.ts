/**
 * Conditions-feed stand-in: a small HTTP service on loopback standing in for a hosted
 * space-weather / sounding service (issue 6). INVENTED DEMO DATA: the layer parameters of each
 * demo region come from our illustrative diurnal model (common/src/conditions/diurnal-model.ts) at
 * the region's centre, scaled by an invented regional factor; nothing here is measured.
 *
 *   GET  /updates?since=<seq>  → { feedId, updates: [{ seq, region, latDeg, lonDeg, validAtUtc, layers }], lastSeq }
 *   POST /updates { region, validAtUtc?, layers? | foF2MHz? / hmF2Km? } → 201 { seq }
 *   GET  /regions              → { regions: [{ region, latDeg, lonDeg }] }
 *
 * One update per region is published for each whole UTC hour (when first asked for after the hour
 * begins). `feedId` identifies this instance: a restarted feed numbers its updates from 1 again.
 * stop()/start() keep the updates and the port, so tests can take the service down and back up.
 */
import { randomUUID } from 'node:crypto';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { diurnalModel, validateProfile, type LayerInput } from '@hopwise/common';

export interface FeedRegion {
  region: string;
  latDeg: number;
  lonDeg: number;
  /** Invented factor on the model's foF2. */
  foF2Factor: number;
}

export const DEMO_REGIONS: readonly FeedRegion[] = [
  { region: 'harrow-sound', latDeg: 47.2, lonDeg: 8.6, foF2Factor: 1.0 },
  { region: 'north-atlantic', latDeg: 55.0, lonDeg: -30.0, foF2Factor: 0.9 },
  { region: 'iberia', latDeg: 40.4, lonDeg: -3.7, foF2Factor: 1.08 },
];

export interface FeedUpdate {
  seq: number;
  region: string;
  latDeg: number;
  lonDeg: number;
  validAtUtc: string;
  layers: LayerInput[];
}

const HOUR_MS = 3_600_000;
const MAX_BODY_BYTES = 100_000;

export class FeedStandin {
  readonly feedId = randomUUID();
  private readonly updates: FeedUpdate[] = [];
  private lastHourMs = -Infinity;
  private server?: Server;
  private port = 0;

  constructor(private readonly now: () => Date = () => new Date()) {}

  get url(): string {
    return `http://127.0.0.1:${this.port}`;
  }

  get running(): boolean {
    return this.server?.listening ?? false;
  }

  /** Listens on 127.0.0.1 (port 0 = any free port the first time; the same port afterwards). */
  async start(port = this.port): Promise<string> {
    if (this.running) return this.url;
    const server = createServer((req, res) => {
      this.handle(req, res).catch(() => send(res, 500, { message: 'internal error' }));
    });
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, '127.0.0.1', () => resolve());
    });
    this.server = server;
    this.port = (server.address() as AddressInfo).port;
    return this.url;
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = undefined;
    if (!server) return;
    server.closeAllConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  /** Updates after `since`, publishing the current hour's regional updates first. */
  updatesSince(since: number): { feedId: string; updates: FeedUpdate[]; lastSeq: number } {
    this.publishHourly();
    return {
      feedId: this.feedId,
      updates: this.updates.filter((u) => u.seq > since),
      lastSeq: this.updates.length,
    };
  }

  /** Adds an update (e.g. a disturbance lowering foF2); throws FeedInputError naming the field. */
  addUpdate(body: unknown): FeedUpdate {
    if (typeof body !== 'object' || body === null)
      throw new FeedInputError('body', 'must be an object');
    const b = body as Record<string, unknown>;
    const region = DEMO_REGIONS.find((r) => r.region === b.region);
    if (!region) {
      throw new FeedInputError(
        'region',
        `must be one of ${DEMO_REGIONS.map((r) => r.region).join(', ')}`,
      );
    }
    const at = b.validAtUtc === undefined ? this.now() : new Date(String(b.validAtUtc));
    if (Number.isNaN(at.getTime()))
      throw new FeedInputError('validAtUtc', 'must be an ISO 8601 time');
    let layers: LayerInput[];
    if (b.layers !== undefined) {
      try {
        layers = (validateProfile({ layers: b.layers }, 'layers') as { layers: LayerInput[] })
          .layers;
      } catch (err) {
        throw new FeedInputError('layers', (err as Error).message);
      }
    } else {
      layers = this.regionLayers(region, at);
      const f2 = layers.find((l) => l.name === 'F2') as LayerInput;
      for (const [key, field, min, max] of [
        ['foF2MHz', 'criticalFrequencyMHz', 0.5, 30],
        ['hmF2Km', 'peakHeightKm', 150, 600],
      ] as const) {
        const v = b[key];
        if (v === undefined) continue;
        if (typeof v !== 'number' || !(v >= min && v <= max)) {
          throw new FeedInputError(key, `must be a number from ${min} to ${max}`);
        }
        f2[field] = v;
      }
    }
    return this.push(region, at, layers);
  }

  private regionLayers(region: FeedRegion, at: Date): LayerInput[] {
    const model = diurnalModel(region, at);
    return model.profile.layers.map((l) =>
      l.name === 'F2'
        ? { ...l, criticalFrequencyMHz: l.criticalFrequencyMHz * region.foF2Factor }
        : { ...l },
    );
  }

  private push(region: FeedRegion, at: Date, layers: LayerInput[]): FeedUpdate {
    const update: FeedUpdate = {
      seq: this.updates.length + 1,
      region: region.region,
      latDeg: region.latDeg,
      lonDeg: region.lonDeg,
      validAtUtc: at.toISOString(),
      layers,
    };
    this.updates.push(update);
    return update;
  }

  private publishHourly(): void {
    const hourMs = Math.floor(this.now().getTime() / HOUR_MS) * HOUR_MS;
    if (hourMs <= this.lastHourMs) return;
    this.lastHourMs = hourMs;
    for (const region of DEMO_REGIONS) {
      this.push(region, new Date(hourMs), this.regionLayers(region, new Date(hourMs)));
    }
  }

  private async handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    if (req.method === 'GET' && url.pathname === '/updates') {
      const raw = url.searchParams.get('since') ?? '0';
      if (!/^\d+$/.test(raw)) return send(res, 400, { message: 'since: must be a whole number' });
      return send(res, 200, this.updatesSince(Number(raw)));
    }
    if (req.method === 'GET' && url.pathname === '/regions') {
      return send(res, 200, {
        regions: DEMO_REGIONS.map(({ region, latDeg, lonDeg }) => ({ region, latDeg, lonDeg })),
      });
    }
    if (req.method === 'POST' && url.pathname === '/updates') {
      let body: unknown;
      try {
        body = JSON.parse(await readBody(req));
      } catch {
        return send(res, 400, { message: 'body: must be JSON' });
      }
      try {
        return send(res, 201, { seq: this.addUpdate(body).seq });
      } catch (err) {
        if (err instanceof FeedInputError) {
          return send(res, 400, { message: err.message, fields: { [err.field]: err.reason } });
        }
        throw err;
      }
    }
    send(res, 404, { message: 'not found' });
  }
}

export class FeedInputError extends Error {
  constructor(
    readonly field: string,
    readonly reason: string,
  ) {
    super(`${field}: ${reason}`);
  }
}

function send(res: ServerResponse, status: number, body: unknown): void {
  const text = JSON.stringify(body);
  res.writeHead(status, {
    'content-type': 'application/json',
    'content-length': Buffer.byteLength(text),
  });
  res.end(text);
}

async function readBody(req: IncomingMessage): Promise<string> {
  let size = 0;
  const chunks: Buffer[] = [];
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > MAX_BODY_BYTES) throw new Error('body too large');
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks).toString('utf8');
}
