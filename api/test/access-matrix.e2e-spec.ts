import { ROLES, hasPermission, type Role } from '@hopwise/common';
import Database from 'better-sqlite3';
import request from 'supertest';
import type { App } from 'supertest/types.js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, login, type TestApp } from './helpers.js';
import { expressRouteKeys, fillPath, listRoutes, resourceOf, type RouteInfo } from './routes.js';

/**
 * Access-control matrix: every route of the router (read from Nest's metadata, so new routes are
 * covered without editing this file) called as anonymous and as each demo role, asserted against
 * the one permission table in common/src/auth/permissions.ts; and, for rows users own, every
 * `:id` route called by another user of the same role → 404 (no leak, no change).
 */

/** Routes open to any signed-in user, each with its reason (no @RequirePermission on purpose). */
const ANY_SIGNED_IN: Record<string, string> = {
  'GET /api/auth/me': 'who am I — every signed-in user',
  'POST /api/auth/refresh': 'renews the caller’s own token',
};

/** Express routes outside the Nest controllers (the OpenAPI document and its UI, public). */
const FRAMEWORK_ROUTE = /^GET \/api\/docs(-json|-yaml)?(\/.*)?$/;

type Create = (ctx: { http: App; token: string; t: TestApp }) => Promise<number>;

interface OwnedResource {
  /** Who creates the private row; the intruder is another user with the same role. */
  ownerRole: Exclude<Role, 'admin'>;
  create: Create;
  /** A body for a route (by key) when `{}` would not reach the ownership check. */
  bodies?: Record<string, object>;
}

async function created(pending: request.Test): Promise<number> {
  const res = await pending;
  if (res.status !== 201) {
    throw new Error(`create failed: ${res.status} ${JSON.stringify(res.body)}`);
  }
  return (res.body as { id: number }).id;
}

const stationBody = (name: string, latDeg: number, lonDeg: number) => ({ name, latDeg, lonDeg });

async function privateLink(http: App, token: string): Promise<number> {
  const post = (body: object) => request(http).post('/api/stations').set(bearer(token)).send(body);
  const a = await created(post(stationBody(`Matrix A ${Math.random()}`, 47.2, 8.6)));
  const b = await created(post(stationBody(`Matrix B ${Math.random()}`, 51.5, -0.1)));
  return created(
    request(http)
      .post('/api/links')
      .set(bearer(token))
      .send({ name: `Matrix link ${Math.random()}`, fromStationId: a, toStationId: b }),
  );
}

/**
 * Resources whose rows belong to a user, keyed by the first path segment after /api. Every
 * resource with an `:id` route must appear here or in NOT_OWNED (asserted below).
 */
const OWNED: Record<string, OwnedResource> = {
  stations: {
    ownerRole: 'operator',
    create: ({ http, token }) =>
      created(
        request(http)
          .post('/api/stations')
          .set(bearer(token))
          .send(stationBody(`Matrix private ${Math.random()}`, 10, 20)),
      ),
  },
  links: { ownerRole: 'operator', create: ({ http, token }) => privateLink(http, token) },
  studies: {
    ownerRole: 'operator',
    create: async ({ http, token }) =>
      created(
        request(http)
          .post('/api/studies')
          .set(bearer(token))
          .send({
            linkId: await privateLink(http, token),
            atUtc: '2026-03-18T12:00:00Z',
            profileSource: { kind: 'reference', key: 'quiet-day' },
            frequenciesMHz: [10],
          }),
      ),
  },
  profiles: {
    ownerRole: 'analyst',
    create: ({ http, token }) =>
      created(
        request(http)
          .post('/api/profiles')
          .set(bearer(token))
          .send({
            name: `Matrix private ${Math.random()}`,
            profile: {
              layers: [
                {
                  name: 'F2',
                  shape: 'chapman',
                  criticalFrequencyMHz: 8,
                  peakHeightKm: 300,
                  scaleHeightKm: 50,
                },
              ],
            },
          }),
      ),
  },
  soundings: {
    ownerRole: 'analyst',
    create: ({ http, token }) =>
      created(
        request(http)
          .post('/api/soundings')
          .set(bearer(token))
          .send({
            name: `Matrix private ${Math.random()}`,
            observedAtUtc: '2026-03-18T12:00:00Z',
            latDeg: 47.2,
            lonDeg: 8.6,
            // Invented monotonic trace (as in soundings.e2e-spec.ts).
            trace: [2, 3, 4, 5, 6].map((f, i) => ({
              frequencyMHz: f,
              virtualHeightKm: [210, 220, 235, 260, 300][i],
            })),
          }),
      ),
  },
};

Object.assign(OWNED, {
  nets: {
    ownerRole: 'netcontrol',
    create: async ({ http, token }) => {
      const post = (body: object) =>
        request(http).post('/api/stations').set(bearer(token)).send(body);
      const control = await created(post(stationBody(`Matrix NC ${Math.random()}`, 47.2, 8.6)));
      const member = await created(post(stationBody(`Matrix NM ${Math.random()}`, 51.5, -0.1)));
      return created(
        request(http)
          .post('/api/nets')
          .set(bearer(token))
          .send({
            name: `Matrix net ${Math.random()}`,
            controlStationId: control,
            memberStationIds: [member],
            channelsKHz: [4625, 9145],
          }),
      );
    },
    bodies: {
      'PUT /api/nets/:id/schedule/overrides': {
        slots: [{ startUtc: '2026-03-20T06:00:00Z', channelKHz: 4625 }],
      },
      'POST /api/nets/:id/publish': { dateUtc: '2026-03-20' },
    },
  },
  notices: {
    ownerRole: 'operator',
    // Notices are written by the watch only: store one for the owner directly.
    create: async ({ http, token, t }) => {
      const me = await request(http).get('/api/auth/me').set(bearer(token)).expect(200);
      const db = new Database(t.config.dbFile);
      try {
        const info = db
          .prepare(
            `INSERT INTO notices (user_id, kind, subject_type, subject_id, change_key, title, body, data)
             VALUES (?, 'best-channel-changed', 'link', 1, ?, 'Matrix notice', 'Private', '{}')`,
          )
          .run((me.body as { id: number }).id, `matrix:${Math.random()}`);
        return Number(info.lastInsertRowid);
      } finally {
        db.close();
      }
    },
  },
} satisfies Record<string, OwnedResource>);

/** Resources with `:id` routes that no ordinary user owns, each with its reason. */
const NOT_OWNED: Record<string, string> = {
  users: 'admin only (users:manage); covered by the role matrix',
};

function call(http: App, route: RouteInfo, url: string, token?: string, body: object = {}) {
  const agent = request(http);
  const method = route.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  let req = agent[method](url);
  if (token) req = req.set(bearer(token));
  if (route.method !== 'GET' && route.method !== 'DELETE') req = req.send(body);
  return req;
}

describe('access-control matrix (every route × anonymous and every role)', () => {
  let t: TestApp;
  let routes: RouteInfo[];
  const tokens = {} as Record<Role, string>;
  /** A second, non-admin user per role: the intruder for owned rows. */
  const otherTokens = {} as Record<Exclude<Role, 'admin'>, string>;

  beforeAll(async () => {
    t = await bootApp();
    routes = listRoutes(t.app);
    for (const role of ROLES) tokens[role] = await login(t.http, `${role}@hopwise.test`);
    for (const role of ['operator', 'netcontrol', 'analyst'] as const) {
      const email = `matrix-${role}-2@hopwise.test`;
      const password = 'Matrix intruder passphrase 7';
      await request(t.http)
        .post('/api/users')
        .set(bearer(tokens.admin))
        .send({ email, password, role })
        .expect(201);
      otherTokens[role] = await login(t.http, email, password);
    }
  });
  afterAll(async () => {
    await t?.close();
  });

  it('reads the routes from Nest, and they are exactly the routes Express serves', () => {
    expect(routes.length).toBeGreaterThan(20);
    const fromNest = new Set(routes.map((r) => r.key));
    const served = expressRouteKeys(t.app).filter((k) => k.split(' ')[1].startsWith('/api'));
    const outside = served.filter((k) => !fromNest.has(k) && !FRAMEWORK_ROUTE.test(k));
    expect(outside).toEqual([]);
    const missing = [...fromNest].filter((k) => !served.includes(k));
    expect(missing).toEqual([]);
  });

  it('has 0 unguarded routes: every non-public route names a permission (or is listed)', () => {
    const unguarded = routes
      .filter((r) => !r.isPublic && r.permissions.length === 0 && !(r.key in ANY_SIGNED_IN))
      .map((r) => r.key);
    expect(unguarded).toEqual([]);
    const publicRoutes = routes.filter((r) => r.isPublic).map((r) => r.key);
    // Public on purpose: health probe and sign-in. Anything else must be added here knowingly.
    expect(
      publicRoutes.filter((k) => !/^(GET \/api\/health|POST \/api\/auth\/login)$/.test(k)),
    ).toEqual([]);
  });

  it('answers 401 to anonymous and forged tokens on every non-public route', async () => {
    let calls = 0;
    for (const route of routes.filter((r) => !r.isPublic)) {
      const url = fillPath(route.path);
      const anon = await call(t.http, route, url);
      expect(anon.status, `${route.key} anonymous`).toBe(401);
      expect(anon.body).toMatchObject({ statusCode: 401, error: 'Unauthorized' });
      const forged = await call(t.http, route, url, `${tokens.admin.slice(0, -4)}AAAA`);
      expect(forged.status, `${route.key} forged token`).toBe(401);
      calls += 2;
    }
    console.info(`access matrix: ${calls} anonymous/forged calls, all 401`);
  });

  it('answers 403 exactly where ROLE_PERMISSIONS lacks the route’s permission', async () => {
    const tally = { forbidden: 0, allowed: 0 };
    const wrong: string[] = [];
    for (const route of routes.filter((r) => !r.isPublic)) {
      const url = fillPath(route.path);
      for (const role of ROLES) {
        const res = await call(t.http, route, url, tokens[role]);
        const allowed = route.permissions.every((p) => hasPermission(role, p));
        const ok = allowed
          ? res.status !== 401 && res.status !== 403 && res.status < 500
          : res.status === 403;
        if (!ok) wrong.push(`${route.key} as ${role}: ${res.status} (allowed=${allowed})`);
        if (!allowed) {
          expect(res.body).toMatchObject({ statusCode: 403, error: 'Forbidden' });
          tally.forbidden += 1;
        } else {
          tally.allowed += 1;
        }
      }
    }
    expect(wrong).toEqual([]);
    console.info(
      `access matrix: ${routes.length} routes × ${ROLES.length} roles: ` +
        `${tally.forbidden} forbidden (403), ${tally.allowed} allowed`,
    );
  });

  it('covers every resource with an :id route by an owned-row recipe or a stated reason', () => {
    const withId = [
      ...new Set(routes.filter((r) => r.path.includes('/:')).map((r) => resourceOf(r.path))),
    ];
    const uncovered = withId.filter((res) => !(res in OWNED) && !(res in NOT_OWNED));
    // A new resource lands here: add a create recipe to OWNED (or a reason to NOT_OWNED).
    expect(uncovered).toEqual([]);
  });

  it('answers 404 to another user’s private row on every :id route, and changes nothing', async () => {
    let calls = 0;
    const leaks: string[] = [];
    for (const [resource, recipe] of Object.entries(OWNED)) {
      const idRoutes = routes.filter(
        (r) => resourceOf(r.path) === resource && /^\/api\/[^/]+\/:id(\/|$)/.test(r.path),
      );
      if (idRoutes.length === 0) continue;
      const owner = tokens[recipe.ownerRole];
      const intruder = otherTokens[recipe.ownerRole];
      const id = await recipe.create({ http: t.http, token: owner, t });
      // Resources without GET /:id (notices) are checked through their list instead.
      const hasGet = routes.some((r) => r.key === `GET /api/${resource}/:id`);
      const read = (token: string) =>
        hasGet
          ? request(t.http).get(`/api/${resource}/${id}`).set(bearer(token))
          : request(t.http).get(`/api/${resource}?limit=500`).set(bearer(token));
      const before = await read(owner);
      expect(before.status, `${resource} ${id} as owner`).toBe(200);

      // Destructive routes last, so the read routes see the row.
      const ordered = [...idRoutes].sort(
        (a, b) => Number(a.method === 'DELETE') - Number(b.method === 'DELETE'),
      );
      for (const route of ordered) {
        const res = await call(
          t.http,
          route,
          fillPath(route.path, id),
          intruder,
          recipe.bodies?.[route.key],
        );
        calls += 1;
        if (res.status !== 404) leaks.push(`${route.key} (${resource} ${id}): ${res.status}`);
      }
      const list = await request(t.http).get(`/api/${resource}?limit=500`).set(bearer(intruder));
      if (list.status === 200) {
        const ids = (list.body as { items: { id: number }[] }).items.map((r) => r.id);
        if (ids.includes(id)) leaks.push(`GET /api/${resource} lists ${resource} ${id}`);
      }
      const after = await read(owner);
      expect(after.status, `${resource} ${id} still there`).toBe(200);
      expect(after.body, `${resource} ${id} unchanged`).toEqual(before.body);
      if (hasGet) {
        const asAdmin = await read(tokens.admin);
        expect(asAdmin.status, `${resource} ${id} as admin`).toBe(200);
      }
    }
    expect(leaks).toEqual([]);
    console.info(`access matrix: ${calls} calls on others’ private rows, all 404`);
  });
});
