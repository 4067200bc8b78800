import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, DEMO_PASSWORD, login, type TestApp } from './helpers.js';

describe('sign-in and tokens', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await bootApp();
  });
  afterAll(async () => {
    await t.close();
  });

  it('logs a demo user in and returns a token and the user', async () => {
    const res = await request(t.http)
      .post('/api/auth/login')
      .send({ email: 'Operator@Hopwise.test', password: DEMO_PASSWORD })
      .expect(200);
    expect(res.body.accessToken).toMatch(/^[\w-]+\.[\w-]+\.[\w-]+$/);
    expect(res.body.user).toEqual({
      id: expect.any(Number),
      email: 'operator@hopwise.test',
      role: 'operator',
      displayName: expect.any(String),
    });
  });

  it('refuses a wrong password and an unknown e-mail with the same 401', async () => {
    const expected = {
      statusCode: 401,
      error: 'Unauthorized',
      message: 'Invalid email or password',
    };
    const wrong = await request(t.http)
      .post('/api/auth/login')
      .send({ email: 'operator@hopwise.test', password: 'not-the-password' })
      .expect(401);
    expect(wrong.body).toEqual(expected);
    const unknown = await request(t.http)
      .post('/api/auth/login')
      .send({ email: 'nobody@hopwise.test', password: DEMO_PASSWORD })
      .expect(401);
    expect(unknown.body).toEqual(expected);
  });

  it('GET /api/auth/me returns the signed-in user', async () => {
    const token = await login(t.http, 'analyst@hopwise.test');
    const res = await request(t.http).get('/api/auth/me').set(bearer(token)).expect(200);
    expect(res.body).toMatchObject({
      email: 'analyst@hopwise.test',
      role: 'analyst',
      disabled: false,
    });
    expect(res.body).not.toHaveProperty('passwordHash');
  });

  it('answers 401 without a token and with a forged one', async () => {
    const none = await request(t.http).get('/api/auth/me').expect(401);
    expect(none.body).toEqual({
      statusCode: 401,
      error: 'Unauthorized',
      message: 'Missing or invalid access token',
    });
    const token = await login(t.http, 'operator@hopwise.test');
    const [h, p] = token.split('.');
    await request(t.http)
      .get('/api/auth/me')
      .set(bearer(`${h}.${p}.AAAA`))
      .expect(401);
  });

  it('answers 403 when the role lacks the permission (operator → GET /api/users)', async () => {
    const token = await login(t.http, 'operator@hopwise.test');
    const res = await request(t.http).get('/api/users').set(bearer(token)).expect(403);
    expect(res.body).toEqual({
      statusCode: 403,
      error: 'Forbidden',
      message: 'Your role does not allow this (needs users:manage)',
    });
  });

  it('refuses a disabled user at login and stops their existing token', async () => {
    const admin = await login(t.http, 'admin@hopwise.test');
    const netToken = await login(t.http, 'netcontrol@hopwise.test');
    await request(t.http).get('/api/auth/me').set(bearer(netToken)).expect(200);

    const me = await request(t.http).get('/api/auth/me').set(bearer(netToken));
    await request(t.http)
      .patch(`/api/users/${me.body.id}`)
      .set(bearer(admin))
      .send({ disabled: true })
      .expect(200);

    const again = await request(t.http)
      .post('/api/auth/login')
      .send({ email: 'netcontrol@hopwise.test', password: DEMO_PASSWORD })
      .expect(401);
    expect(again.body.message).toBe('Account disabled');
    const wrongPw = await request(t.http)
      .post('/api/auth/login')
      .send({ email: 'netcontrol@hopwise.test', password: 'wrong-password' })
      .expect(401);
    expect(wrongPw.body.message).toBe('Invalid email or password');

    const old = await request(t.http).get('/api/auth/me').set(bearer(netToken)).expect(401);
    expect(old.body).toEqual({
      statusCode: 401,
      error: 'Unauthorized',
      message: 'Account disabled',
    });
  });
});

describe('demo seed switched off', () => {
  it('HOPWISE_DEMO=0 starts with no accounts', async () => {
    const t = await bootApp({ HOPWISE_DEMO: '0' });
    try {
      await request(t.http)
        .post('/api/auth/login')
        .send({ email: 'admin@hopwise.test', password: DEMO_PASSWORD })
        .expect(401);
      const n = t.db.$client.prepare('select count(*) as n from users').get() as { n: number };
      expect(n.n).toBe(0);
    } finally {
      await t.close();
    }
  });
});
