import Database from 'better-sqlite3';
import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, login, type TestApp } from './helpers.js';
import { fillPath, listRoutes, type RouteInfo } from './routes.js';

/**
 * Bad-input fuzzing of every POST/PATCH/PUT route (enumerated from the router): generated
 * malformed bodies — wrong types, NaN/Infinity strings, huge numbers, bounded huge arrays, deep
 * nesting, unicode, injection strings, prototype-pollution keys. Never a 5xx; every 4xx in the
 * one error shape naming a field or row; row counts of every table unchanged afterwards.
 * Every body carries at least one certain fault (an unknown or prototype key, or a known field
 * of the wrong JSON type), so none may be stored. `HOPWISE_FUZZ_RUNS` sets the runs per route.
 */
const RUNS = Number(process.env.HOPWISE_FUZZ_RUNS ?? 200);
/** Fixed seed: the same bodies every run (set HOPWISE_FUZZ_SEED to explore others). */
const SEED = Number(process.env.HOPWISE_FUZZ_SEED ?? 20260318);
/** Requests in flight at once (the server is one process; this only overlaps client overhead). */
const CONCURRENCY = 4;

async function inBatches<T>(items: T[], fn: (item: T) => Promise<void>): Promise<void> {
  for (let i = 0; i < items.length; i += CONCURRENCY) {
    await Promise.all(items.slice(i, i + CONCURRENCY).map(fn));
  }
}

type JsonType = 'string' | 'number' | 'integer' | 'boolean' | 'array' | 'object';
interface Field {
  name: string;
  type?: JsonType;
}

const INJECTION = [
  "'; DROP TABLE users; --",
  '" OR 1=1 --',
  '<script>alert(1)</script>',
  '${7*7}',
  '{{7*7}}',
  '../../../../etc/passwd',
  '\u0000',
  '%00',
  '=HYPERLINK("http://x")',
  '\u202Egnp.exe',
  'Ω≈ç√∫˜µ≤≥÷ 田中 🚀 زیر',
];
const NUMBERISH = ['NaN', 'Infinity', '-Infinity', '1e309', '-0', '0x10', ' 12 ', '', '١٢', '1,5'];

const scalar = fc.oneof(
  fc.constantFrom(...INJECTION, ...NUMBERISH),
  fc.constantFrom(1e308, -1e308, 2 ** 53 + 2, -(2 ** 63), 5e-324, 0, -1),
  fc.double(),
  fc.integer(),
  fc.boolean(),
  fc.constant(null),
  fc.string({ maxLength: 40, unit: 'grapheme' }),
  fc.string({ maxLength: 40, unit: 'binary' }),
);

/** Deep nesting (bounded): `{"a":{"a":…}}` or `[[[…]]]`. */
const deep = fc.tuple(fc.integer({ min: 20, max: 200 }), fc.boolean()).map(([depth, asArray]) => {
  let v: unknown = 1;
  for (let i = 0; i < depth; i += 1) v = asArray ? [v] : { a: v };
  return v;
});

/** Huge arrays, bounded so a body stays under the 2 MB body limit. */
const hugeArray = fc
  .tuple(fc.integer({ min: 2_001, max: 10_000 }), scalar)
  .map(([n, v]) => Array.from({ length: n }, () => v));

const value: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: scalar },
  { weight: 1, arbitrary: deep },
  { weight: 1, arbitrary: hugeArray },
  { weight: 2, arbitrary: fc.array(scalar, { maxLength: 6 }) },
  { weight: 2, arbitrary: fc.dictionary(fc.string({ maxLength: 8 }), scalar, { maxKeys: 4 }) },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 4 }) },
);

/** A value that is certainly not of the field's JSON type, even after `@Type(() => Number)`. */
function wrongFor(type: JsonType | undefined): fc.Arbitrary<unknown> {
  const object = fc.constantFrom<unknown>(
    { $gt: '' },
    { __proto__: null, a: [1] },
    { x: { y: 'z' } },
  );
  if (type === 'array' || type === 'object') {
    return fc.oneof(fc.constantFrom(...INJECTION, ...NUMBERISH), fc.double(), fc.boolean());
  }
  return object;
}

const POLLUTION_KEYS = ['__proto__', 'constructor', 'prototype', '$where', 'isAdmin', 'role_'];

/** Sets an own, enumerable key (also `__proto__`, which a literal or `o[k] =` would not). */
function setOwn(o: Record<string, unknown>, key: string, v: unknown) {
  Object.defineProperty(o, key, { value: v, enumerable: true, configurable: true, writable: true });
}

function malformedBody(fields: Field[]): fc.Arbitrary<unknown> {
  const known = fields.length > 0 ? fields : [{ name: 'name' }, { name: 'profile' }];
  const withFields = fc
    .tuple(
      fc.subarray(known),
      fc.array(value, { minLength: known.length, maxLength: known.length }),
      fc.nat(),
      fc.oneof(
        fc.record({
          kind: fc.constant('key' as const),
          key: fc.constantFrom(...POLLUTION_KEYS),
          v: value,
        }),
        fc.record({
          kind: fc.constant('key' as const),
          key: fc.string({ minLength: 1, maxLength: 12 }).map((s) => `zz${s}`),
          v: value,
        }),
        fc.record({
          kind: fc.constant('wrong' as const),
          key: fc.constant(''),
          v: fc.constant(null),
        }),
      ),
      fc.constantFrom(...known.map((f) => f.type)).chain((t) => wrongFor(t)),
    )
    .map(([chosen, values, pick, fault, wrong]) => {
      const body: Record<string, unknown> = {};
      chosen.forEach((f, i) => setOwn(body, f.name, values[i]));
      if (fault.kind === 'key' || known.every((f) => !f.type)) {
        setOwn(body, fault.key || '__proto__', fault.v);
      } else {
        const typed = known.filter((f) => f.type);
        const target = typed[pick % typed.length];
        setOwn(body, target.name, wrongForSync(target.type, wrong));
      }
      return body;
    });
  // Whole-body faults: not an object at all.
  const notObject = fc.oneof(
    fc.array(value, { maxLength: 5 }),
    fc.constantFrom('"just a string"', '42', 'null', 'true', '[]'),
  );
  return fc.oneof({ weight: 9, arbitrary: withFields }, { weight: 1, arbitrary: notObject });
}

/** The chosen wrong value when it fits the target's type class, else a safe wrong value. */
function wrongForSync(type: JsonType | undefined, candidate: unknown): unknown {
  const isContainer = type === 'array' || type === 'object';
  const candidateIsObject = typeof candidate === 'object' && candidate !== null;
  if (isContainer) return candidateIsObject ? 'not-a-container' : candidate;
  return candidateIsObject ? candidate : { $gt: '' };
}

/** Request-body fields per route from the OpenAPI document (`/api/x/{id}` ↔ `/api/x/:id`). */
type Schema = {
  $ref?: string;
  properties?: Record<string, Schema>;
  type?: JsonType | JsonType[];
  allOf?: Schema[];
  oneOf?: Schema[];
  anyOf?: Schema[];
};
function fieldsFromDoc(doc: Record<string, unknown>, route: RouteInfo): Field[] {
  const paths = doc.paths as Record<
    string,
    Record<string, { requestBody?: { content?: Record<string, { schema?: Schema }> } }>
  >;
  const op = paths[route.path.replace(/:(\w+)/g, '{$1}')]?.[route.method.toLowerCase()];
  const content = op?.requestBody?.content ?? {};
  const schema = content['application/json']?.schema ?? content['multipart/form-data']?.schema;
  const schemas = (doc.components as { schemas?: Record<string, Schema> })?.schemas ?? {};
  const resolve = (s: Schema | undefined, depth = 0): Schema | undefined => {
    if (!s || depth > 5) return s;
    if (s.$ref) return resolve(schemas[s.$ref.split('/').pop() ?? ''], depth + 1);
    if (s.allOf?.length) {
      return {
        properties: Object.assign(
          {},
          ...s.allOf.map((x) => resolve(x, depth + 1)?.properties ?? {}),
        ),
      };
    }
    return s;
  };
  const props = resolve(schema)?.properties ?? {};
  return Object.entries(props).map(([name, s]) => {
    const r = resolve(s);
    const type = Array.isArray(r?.type) ? r?.type.find((x) => x !== ('null' as JsonType)) : r?.type;
    return { name, type: r?.oneOf || r?.anyOf ? undefined : type };
  });
}

function routeTakesBody(doc: Record<string, unknown>, route: RouteInfo): boolean {
  const paths = doc.paths as Record<string, Record<string, { requestBody?: unknown }>>;
  return (
    paths[route.path.replace(/:(\w+)/g, '{$1}')]?.[route.method.toLowerCase()]?.requestBody !==
    undefined
  );
}

function tableCounts(file: string): Record<string, number> {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const tables = db
      .prepare(`SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'`)
      .all() as { name: string }[];
    return Object.fromEntries(
      tables.map(({ name }) => [
        name,
        (
          db.prepare(`SELECT count(*) AS n FROM "${name.replace(/"/g, '""')}"`).get() as {
            n: number;
          }
        ).n,
      ]),
    );
  } finally {
    db.close();
  }
}

/** The one error shape, and a message that names a field, a row or the body. */
function checkErrorBody(
  route: RouteInfo,
  status: number,
  body: Record<string, unknown>,
  sent: unknown,
) {
  const where = `${route.key} → ${status} for ${JSON.stringify(sent)?.slice(0, 300)}`;
  expect(body.statusCode, where).toBe(status);
  expect(typeof body.error, where).toBe('string');
  expect(typeof body.message, where).toBe('string');
  expect((body.message as string).length, where).toBeGreaterThan(0);
  expect(JSON.stringify(body), where).not.toMatch(/\n\s+at |node_modules|\.ts:\d+/);
  if (status === 400 || status === 422) {
    const names = [...Object.keys(body.fields ?? {}), ...(Array.isArray(body.rows) ? ['row'] : [])];
    const message = body.message as string;
    const namesSomething =
      names.length > 0 ||
      /\b(body|JSON|row|file|field|profile|[a-z]+[A-Z][A-Za-z]*|[a-z]+(\.|\[)\w)/.test(message);
    expect(namesSomething, `${where}: ${message}`).toBe(true);
  }
}

describe('bad-input fuzzing of every POST/PATCH/PUT route', () => {
  let t: TestApp;
  let admin: string;
  let routes: RouteInfo[];
  let doc: Record<string, unknown>;
  /** One listening socket for the whole run (supertest would otherwise listen per request). */
  let base: string;
  const statuses: Record<string, Record<number, number>> = {};
  const skipped: string[] = [];

  beforeAll(async () => {
    // Compute routes share one worker; a short timeout bounds any body that slips to the physics.
    // Background writers off (feed poll, watch, outbox), so row counts move only by requests.
    t = await bootApp({
      HOPWISE_COMPUTE_TIMEOUT_MS: '3000',
      HOPWISE_FEED_POLL_MS: '0',
      HOPWISE_WATCH_INTERVAL_MS: '0',
      HOPWISE_DELIVERY_INTERVAL_MS: '0',
    });
    admin = await login(t.http, 'admin@hopwise.test');
    await t.app.listen(0, '127.0.0.1');
    base = await t.app.getUrl();
    routes = listRoutes(t.app).filter((r) => ['POST', 'PATCH', 'PUT'].includes(r.method));
    doc = (await request(t.http).get('/api/docs-json').expect(200)).body as Record<string, unknown>;
  });
  afterAll(async () => {
    console.info(
      `fuzz: ${RUNS} bodies per route on ${Object.keys(statuses).length} routes; statuses:\n` +
        Object.entries(statuses)
          .map(([k, s]) => `  ${k}: ${JSON.stringify(s)}`)
          .join('\n') +
        `\n  skipped (no body, no :id): ${skipped.join(', ') || 'none'}`,
    );
    await t?.close();
  });

  it('finds the write routes', () => {
    expect(routes.length).toBeGreaterThan(10);
  });

  it('never answers 5xx, answers in the one error shape, and stores nothing', async () => {
    for (const [routeIndex, route] of routes.entries()) {
      const fields = fieldsFromDoc(doc, route);
      const url = fillPath(route.path);
      const tally: Record<number, number> = {};
      const before = tableCounts(t.config.dbFile);
      const hasBody = fields.length > 0 || routeTakesBody(doc, route);
      // No body and no row to address (e.g. "poll the feed now"): nothing to fuzz.
      if (!hasBody && !route.path.includes('/:')) {
        skipped.push(route.key);
        continue;
      }
      statuses[route.key] = tally;
      const bodies = fc.sample(malformedBody(fields), { numRuns: RUNS, seed: SEED + routeIndex });
      await inBatches(bodies, async (body) => {
        const method = route.method.toLowerCase() as 'post' | 'patch' | 'put';
        const raw = typeof body === 'string' ? body : JSON.stringify(body);
        const agent = request(base);
        const res = await agent[method](url)
          .set(bearer(admin))
          .set('Content-Type', 'application/json')
          .send(raw);
        tally[res.status] = (tally[res.status] ?? 0) + 1;
        expect(res.status, `${route.key} ${raw.slice(0, 300)}`).toBeLessThan(500);
        // A route without a body (e.g. "mark all read") ignores what is sent: any non-5xx is fine.
        if (!hasBody && res.status < 400) return;
        expect(res.status, `${route.key} accepted ${raw.slice(0, 300)}`).toBeGreaterThanOrEqual(
          400,
        );
        checkErrorBody(route, res.status, res.body as Record<string, unknown>, body);
      });
      expect(tableCounts(t.config.dbFile), route.key).toEqual(before);
    }
  }, 600_000);

  it('answers truncated and garbled multipart bodies to every upload route with a 4xx', async () => {
    const uploads = routes.filter((r) => r.path.endsWith('/upload'));
    expect(uploads.length).toBeGreaterThan(0);
    const boundary = '----hopwiseFuzzBoundary';
    const good = Buffer.from(
      [
        `--${boundary}`,
        'Content-Disposition: form-data; name="name"',
        '',
        'Fuzzed',
        `--${boundary}`,
        'Content-Disposition: form-data; name="file"; filename="s.csv"',
        'Content-Type: text/csv',
        '',
        'heightKm,electronDensityPerM3\n100,0\n200,1e11\n300,1e12',
        `--${boundary}--`,
        '',
      ].join('\r\n'),
    );
    const mangled = fc.oneof(
      fc.nat({ max: good.length - 1 }).map((cut) => good.subarray(0, cut)),
      fc
        .array(fc.tuple(fc.nat({ max: good.length - 1 }), fc.integer({ min: 0, max: 255 })), {
          minLength: 1,
          maxLength: 12,
        })
        .map((edits) => {
          const b = Buffer.from(good);
          for (const [i, byte] of edits) b[i] = byte;
          return b;
        }),
      fc.uint8Array({ maxLength: 2000 }).map((a) => Buffer.from(a)),
    );
    for (const route of uploads) {
      const before = tableCounts(t.config.dbFile);
      const tally: Record<number, number> = {};
      statuses[`${route.key} (multipart)`] = tally;
      const cases = fc.sample(fc.tuple(mangled, fc.boolean()), {
        numRuns: Math.max(50, Math.round(RUNS / 2)),
        seed: SEED,
      });
      await inBatches(cases, async ([buf, keepBoundary]) => {
        const res = await request(base)
          .post(route.path)
          .set(bearer(admin))
          .set(
            'Content-Type',
            keepBoundary ? `multipart/form-data; boundary=${boundary}` : 'multipart/form-data',
          )
          .send(buf);
        tally[res.status] = (tally[res.status] ?? 0) + 1;
        expect(res.status, route.key).toBeLessThan(500);
        // A mangled byte inside the CSV numbers may still leave a valid file: 201 is then right.
        if (res.status >= 400) checkErrorBody(route, res.status, res.body, '(multipart)');
      });
      const after = tableCounts(t.config.dbFile);
      const stored = tally[201] ?? 0;
      const changed = Object.keys(after).filter((k) => after[k] !== before[k]);
      // Only a complete, valid upload may store a row (one per 201, plus its audit entry).
      for (const table of changed)
        expect(after[table] - before[table], table).toBeLessThanOrEqual(stored);
    }
  }, 300_000);
});
