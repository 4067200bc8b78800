import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bootApp, type TestApp } from './helpers.js';

describe('login throttling', () => {
  let t: TestApp;
  const LOGIN_LIMIT = 3;
  beforeAll(async () => {
    t = await bootApp({ HOPWISE_LOGIN_THROTTLE_LIMIT: String(LOGIN_LIMIT) });
  });
  afterAll(async () => {
    await t.close();
  });

  it(`answers 429 in the error shape after ${LOGIN_LIMIT} bad logins a minute`, async () => {
    const attempt = () =>
      request(t.http)
        .post('/api/auth/login')
        .send({ email: 'admin@hopwise.test', password: 'guess-number-n' });
    for (let i = 0; i < LOGIN_LIMIT; i++) await attempt().expect(401);
    const res = await attempt().expect(429);
    expect(res.body).toEqual({
      statusCode: 429,
      error: 'Too Many Requests',
      message: 'Too many requests; wait a minute and try again',
    });
    expect(res.headers['retry-after-login']).toBeDefined();
  });

  it('does not count other routes against the login limit', async () => {
    for (let i = 0; i < LOGIN_LIMIT + 2; i++) {
      await request(t.http).get('/api/health').expect(200);
      await request(t.http).get('/api/auth/me').expect(401);
    }
  });
});

describe('global throttling', () => {
  it('limits every route per client', async () => {
    const t = await bootApp({ HOPWISE_THROTTLE_LIMIT: '2' });
    try {
      await request(t.http).get('/api/auth/me').expect(401);
      await request(t.http).get('/api/auth/me').expect(401);
      const res = await request(t.http).get('/api/auth/me').expect(429);
      expect(res.body.statusCode).toBe(429);
    } finally {
      await t.close();
    }
  });
});
