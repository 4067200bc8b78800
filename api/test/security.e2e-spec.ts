import { JwtService } from '@nestjs/jwt';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LOCK_MINUTES, MAX_FAILED_LOGINS } from '../src/auth/login-lockout.js';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

/**
 * Security hardening: token expiry and refresh, password rules, per-account lock-out, CORS,
 * security headers, no stack traces in error bodies, the audit log API. No waiting on clocks:
 * expired tokens are signed with a past `exp` (RFC 7519 §4.1.4) by the app's own secret.
 */
describe('security', () => {
  let t: TestApp;
  let admin: string;

  beforeAll(async () => {
    t = await bootApp({ HOPWISE_JWT_TTL: '900s' });
    admin = await login(t.http, 'admin@hopwise.test');
  });
  afterAll(async () => {
    await t?.close();
  });

  describe('tokens', () => {
    it('issues tokens that expire after HOPWISE_JWT_TTL', async () => {
      const token = await login(t.http, 'operator@hopwise.test');
      const claims = JSON.parse(Buffer.from(token.split('.')[1], 'base64url').toString()) as {
        iat: number;
        exp: number;
      };
      expect(claims.exp - claims.iat).toBe(900);
    });

    it('refuses an expired token with 401 and a valid one still works', async () => {
      const jwt = new JwtService({ secret: t.config.jwtSecret });
      const me = await request(t.http).get('/api/auth/me').set(bearer(admin)).expect(200);
      const nowS = Math.floor(Date.now() / 1000);
      const expired = await jwt.signAsync(
        { sub: String(me.body.id), role: 'admin', iat: nowS - 3600, exp: nowS - 60 },
        { algorithm: 'HS256' },
      );
      const res = await request(t.http).get('/api/users').set(bearer(expired)).expect(401);
      expect(res.body).toMatchObject({ statusCode: 401, error: 'Unauthorized' });
      await request(t.http).post('/api/auth/refresh').set(bearer(expired)).expect(401);
      await request(t.http).get('/api/users').set(bearer(admin)).expect(200);
    });

    it('refuses a token signed with another secret or with "alg": "none"', async () => {
      const other = new JwtService({ secret: 'some-other-secret-0123456789-0123456789' });
      const forged = await other.signAsync({ sub: '1', role: 'admin' }, { expiresIn: 600 });
      await request(t.http).get('/api/auth/me').set(bearer(forged)).expect(401);
      const header = Buffer.from('{"alg":"none","typ":"JWT"}').toString('base64url');
      const body = Buffer.from(
        JSON.stringify({ sub: '1', role: 'admin', exp: Math.floor(Date.now() / 1000) + 600 }),
      ).toString('base64url');
      await request(t.http)
        .get('/api/auth/me')
        .set(bearer(`${header}.${body}.`))
        .expect(401);
    });

    it('POST /api/auth/refresh trades a valid token for a fresh one', async () => {
      const token = await login(t.http, 'analyst@hopwise.test');
      const res = await request(t.http).post('/api/auth/refresh').set(bearer(token)).expect(200);
      expect(res.body.accessToken).toMatch(/^[\w-]+\.[\w-]+\.[\w-]+$/);
      expect(res.body.user).toMatchObject({ email: 'analyst@hopwise.test', role: 'analyst' });
      await request(t.http).get('/api/auth/me').set(bearer(res.body.accessToken)).expect(200);
      await request(t.http).post('/api/auth/refresh').expect(401);
    });
  });

  describe('password rules on new accounts', () => {
    const create = (email: string, password: string) =>
      request(t.http)
        .post('/api/users')
        .set(bearer(admin))
        .send({ email, password, role: 'operator' });

    it.each([
      ['short', 'short-pw', 'at least 10 characters'],
      ['the e-mail', 'rules.one@example.org', 'e-mail'],
      ['the e-mail local part', 'xx-rules.two-xx', 'e-mail'],
      ['common', 'password123', 'too common'],
      ['repeated', 'aaaaaaaaaaaa', 'repeated'],
    ])('refuses a %s password with 400 naming the field', async (_label, password, reason) => {
      const email = password.includes('two') ? 'rules.two@example.org' : 'rules.one@example.org';
      const res = await create(email, password).expect(400);
      expect(res.body.fields.password).toContain(reason);
    });

    it('accepts a long passphrase', async () => {
      await create('rules.ok@example.org', 'copper kettle at dawn').expect(201);
    });
  });

  describe('lock-out after repeated failed sign-ins', () => {
    it(`locks one account after ${MAX_FAILED_LOGINS} wrong passwords (423, Retry-After), others unaffected`, async () => {
      const email = 'lockme@example.org';
      const password = 'right horse battery';
      await request(t.http)
        .post('/api/users')
        .set(bearer(admin))
        .send({ email, password, role: 'operator' })
        .expect(201);
      const attempt = (pw: string) =>
        request(t.http).post('/api/auth/login').send({ email, password: pw });

      // A success in between resets the count.
      for (let i = 0; i < MAX_FAILED_LOGINS - 1; i++) await attempt('wrong password!').expect(401);
      await attempt(password).expect(200);
      for (let i = 0; i < MAX_FAILED_LOGINS; i++) await attempt('wrong password!').expect(401);

      const locked = await attempt(password).expect(423);
      expect(locked.body).toEqual({
        statusCode: 423,
        error: 'Locked',
        message: 'Too many failed sign-ins for this account; try again later',
      });
      const retryAfterS = Number(locked.headers['retry-after']);
      expect(retryAfterS).toBeGreaterThan(0);
      expect(retryAfterS).toBeLessThanOrEqual(LOCK_MINUTES * 60);
      // Stored on the user row (survives restarts).
      const row = t.db.$client
        .prepare('SELECT failed_login_count AS n, locked_until AS until FROM users WHERE email = ?')
        .get(email) as { n: number; until: string };
      expect(Date.parse(row.until)).toBeGreaterThan(Date.now());

      await login(t.http, 'operator@hopwise.test');
      // When the lock has passed, the right password works again.
      t.db.$client
        .prepare('UPDATE users SET locked_until = ? WHERE email = ?')
        .run(new Date(Date.now() - 1000).toISOString(), email);
      await attempt(password).expect(200);
      // Each sign-in runs one scrypt (tens of ms idle, seconds on a loaded 2-core machine).
    }, 180_000);
  });

  describe('headers', () => {
    it('sends security headers and no X-Powered-By', async () => {
      const res = await request(t.http).get('/api/health').expect(200);
      expect(res.headers['content-security-policy']).toContain("default-src 'self'");
      expect(res.headers['content-security-policy']).toContain("frame-ancestors 'none'");
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      expect(res.headers['referrer-policy']).toBe('no-referrer');
      expect(res.headers['strict-transport-security']).toMatch(/max-age=\d+/);
      expect(res.headers['x-powered-by']).toBeUndefined();
    });

    it('sends no CORS headers when HOPWISE_CORS_ORIGIN is unset', async () => {
      const res = await request(t.http)
        .options('/api/health')
        .set('Origin', 'https://elsewhere.example')
        .set('Access-Control-Request-Method', 'GET');
      expect(res.headers['access-control-allow-origin']).toBeUndefined();
    });
  });

  describe('audit log', () => {
    it('lists admin actions newest first with paging, for audit:read only', async () => {
      await request(t.http)
        .post('/api/users')
        .set(bearer(admin))
        .send({ email: 'audited@example.org', password: 'copper kettle at noon', role: 'analyst' })
        .expect(201);
      const res = await request(t.http)
        .get('/api/audit?limit=2&action=user')
        .set(bearer(admin))
        .expect(200);
      expect(res.body.items).toHaveLength(2);
      expect(res.body.total).toBeGreaterThanOrEqual(2);
      expect(res.body.items[0]).toMatchObject({
        action: 'user.create',
        target: expect.stringMatching(/^user:\d+$/),
        actorEmail: 'admin@hopwise.test',
        at: expect.stringMatching(/Z$/),
      });
      expect(res.body.items[0].at >= res.body.items[1].at).toBe(true);
      const page2 = await request(t.http)
        .get('/api/audit?limit=2&offset=2&action=user')
        .set(bearer(admin))
        .expect(200);
      expect(page2.body.items.map((e: { id: number }) => e.id)).not.toContain(res.body.items[0].id);

      const bad = await request(t.http).get('/api/audit?limit=0').set(bearer(admin)).expect(400);
      expect(bad.body.fields).toHaveProperty('limit');
      const operator = await login(t.http, 'operator@hopwise.test');
      await request(t.http).get('/api/audit').set(bearer(operator)).expect(403);
    });

    it('records publishing a profile', async () => {
      const analyst = await login(t.http, 'analyst@hopwise.test');
      const created = await request(t.http)
        .post('/api/profiles')
        .set(bearer(analyst))
        .send({
          name: 'Audit publish test',
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
        })
        .expect(201);
      await request(t.http)
        .post(`/api/profiles/${created.body.id}/publish`)
        .set(bearer(analyst))
        .expect((r) => expect(r.status).toBeLessThan(300));
      const res = await request(t.http)
        .get(`/api/audit?target=profile:${created.body.id}`)
        .set(bearer(admin))
        .expect(200);
      expect(res.body.items.map((e: { action: string }) => e.action)).toEqual(
        expect.arrayContaining([expect.stringMatching(/publish/)]),
      );
    });
  });
});

describe('CORS limited to HOPWISE_CORS_ORIGIN', () => {
  let t: TestApp;
  const APP_ORIGIN = 'https://hopwise.example.org';
  beforeAll(async () => {
    t = await bootApp({ HOPWISE_CORS_ORIGIN: APP_ORIGIN });
  });
  afterAll(async () => {
    await t?.close();
  });

  it('allows the app origin and no other', async () => {
    const preflight = (origin: string) =>
      request(t.http)
        .options('/api/auth/login')
        .set('Origin', origin)
        .set('Access-Control-Request-Method', 'POST');
    const ok = await preflight(APP_ORIGIN);
    expect(ok.headers['access-control-allow-origin']).toBe(APP_ORIGIN);
    const other = await preflight('https://evil.example');
    expect(other.headers['access-control-allow-origin']).toBeUndefined();
  });
});

describe('errors never carry a stack trace', () => {
  it('answers an unexpected failure with a generic 500 in the error shape', async () => {
    const t = await bootApp();
    try {
      // Force a real server fault: the database goes away under a running app (sign-in reads it;
      // signed-in routes would answer 401, as the token check cannot re-read the user).
      t.db.$client.close();
      const res = await request(t.http)
        .post('/api/auth/login')
        .send({ email: 'operator@hopwise.test', password: 'hopwise-demo' })
        .expect(500);
      expect(res.body).toEqual({
        statusCode: 500,
        error: 'Internal Server Error',
        message: 'Internal server error',
      });
      expect(res.text).not.toMatch(/\bat \S+ \(|node_modules|\.ts:\d+|database/i);
    } finally {
      await t.close();
    }
  });
});
