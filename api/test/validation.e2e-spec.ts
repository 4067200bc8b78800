import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

describe('one validation pipe, one error shape', () => {
  let t: TestApp;
  let admin: string;
  beforeAll(async () => {
    t = await bootApp();
    admin = await login(t.http, 'admin@hopwise.test');
  });
  afterAll(async () => {
    await t.close();
  });

  it('missing email → 400 naming email', async () => {
    const res = await request(t.http)
      .post('/api/auth/login')
      .send({ password: 'whatever-long' })
      .expect(400);
    expect(res.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Invalid request: email is required',
      fields: { email: 'email is required' },
    });
  });

  it('bad role → 400 naming role', async () => {
    const res = await request(t.http)
      .post('/api/users')
      .set(bearer(admin))
      .send({ email: 'x@example.org', password: 'a-long-password', role: 'superuser' })
      .expect(400);
    expect(res.body.fields).toEqual({
      role: 'role must be one of: operator, netcontrol, analyst, admin',
    });
    expect(res.body.message).toContain('role must be one of');
  });

  it('extra field → 400 naming it', async () => {
    const res = await request(t.http)
      .post('/api/auth/login')
      .send({ email: 'admin@hopwise.test', password: 'hopwise-demo', isAdmin: true })
      .expect(400);
    expect(res.body.fields).toEqual({ isAdmin: 'property isAdmin should not exist' });
  });

  it('invalid e-mail → 400 naming email', async () => {
    const res = await request(t.http)
      .post('/api/auth/login')
      .send({ email: 'not-an-address', password: 'whatever-long' })
      .expect(400);
    expect(res.body.fields).toEqual({ email: 'email must be an e-mail address' });
  });

  it('wrong type → 400 naming the field', async () => {
    const res = await request(t.http)
      .patch('/api/users/1')
      .set(bearer(admin))
      .send({ disabled: 'yes' })
      .expect(400);
    expect(res.body.fields).toEqual({ disabled: 'disabled must be a boolean value' });
  });

  it('malformed JSON → 400 Malformed JSON body', async () => {
    const res = await request(t.http)
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('{"email": "admin@hopwise.test",')
      .expect(400);
    expect(res.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Malformed JSON body',
    });
  });

  it('a JSON array instead of an object → 400, not 500', async () => {
    const res = await request(t.http)
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('[1,2]')
      .expect(400);
    expect(res.body.statusCode).toBe(400);
  });
});
