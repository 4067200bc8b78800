import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

interface AuditRowRaw {
  actor_user_id: number | null;
  action: string;
  target: string;
  detail: string;
}

describe('user administration', () => {
  let t: TestApp;
  let admin: string;
  let adminId: number;
  beforeAll(async () => {
    t = await bootApp();
    admin = await login(t.http, 'admin@hopwise.test');
    adminId = (await request(t.http).get('/api/auth/me').set(bearer(admin))).body.id;
  });
  afterAll(async () => {
    await t.close();
  });

  const audit = (target: string) =>
    t.db.$client
      .prepare(
        'select actor_user_id, action, target, detail from audit_log where target = ? order by id',
      )
      .all(target) as AuditRowRaw[];

  it('lists users with a total, paged', async () => {
    const all = await request(t.http).get('/api/users').set(bearer(admin)).expect(200);
    expect(all.body.total).toBe(4);
    expect(all.body.items).toHaveLength(4);
    expect(all.body.items[0]).toEqual({
      id: expect.any(Number),
      email: 'operator@hopwise.test',
      displayName: expect.any(String),
      role: 'operator',
      disabled: false,
      createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/),
    });
    const page = await request(t.http)
      .get('/api/users?limit=2&offset=3')
      .set(bearer(admin))
      .expect(200);
    expect(page.body.total).toBe(4);
    expect(page.body.items.map((u: { email: string }) => u.email)).toEqual(['admin@hopwise.test']);
  });

  it('refuses a bad page size naming the parameter', async () => {
    const res = await request(t.http).get('/api/users?limit=0').set(bearer(admin)).expect(400);
    expect(Object.keys(res.body.fields)).toEqual(['limit']);
  });

  it('creates a user (201), stores a scrypt hash, writes an audit row, lets them sign in', async () => {
    const res = await request(t.http)
      .post('/api/users')
      .set(bearer(admin))
      .send({ email: 'New.Op@Example.org', password: 'a-long-password', role: 'operator' })
      .expect(201);
    expect(res.body).toMatchObject({
      email: 'new.op@example.org',
      role: 'operator',
      disabled: false,
    });
    expect(res.body.displayName).toBe('new.op');
    const id = res.body.id as number;

    const row = t.db.$client.prepare('select password_hash from users where id = ?').get(id) as {
      password_hash: string;
    };
    expect(row.password_hash).not.toContain('a-long-password');
    expect(row.password_hash).toMatch(/^scrypt\$\d+\$\d+\$\d+\$[A-Za-z0-9+/=]+\$[A-Za-z0-9+/=]+$/);

    const rows = audit(`user:${id}`);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ actor_user_id: adminId, action: 'user.create' });
    expect(JSON.parse(rows[0].detail)).toMatchObject({
      email: 'new.op@example.org',
      role: 'operator',
    });
    expect(rows[0].detail).not.toContain('a-long-password');

    await login(t.http, 'new.op@example.org', 'a-long-password');
  });

  it('refuses a duplicate e-mail with 409 naming email', async () => {
    const res = await request(t.http)
      .post('/api/users')
      .set(bearer(admin))
      .send({ email: 'ANALYST@hopwise.test', password: 'a-long-password', role: 'analyst' })
      .expect(409);
    expect(res.body).toEqual({
      statusCode: 409,
      error: 'Conflict',
      message: 'A user with this e-mail already exists',
      fields: { email: 'already in use' },
    });
  });

  it('refuses a short password naming password', async () => {
    const res = await request(t.http)
      .post('/api/users')
      .set(bearer(admin))
      .send({ email: 'short@example.org', password: 'short', role: 'operator' })
      .expect(400);
    expect(res.body.fields).toEqual({ password: 'password must be at least 10 characters long' });
    expect(res.body.message).toContain('password');
  });

  it('changes a role and disables a user, each with an audit row', async () => {
    const created = await request(t.http)
      .post('/api/users')
      .set(bearer(admin))
      .send({ email: 'promote@example.org', password: 'a-long-password', role: 'operator' })
      .expect(201);
    const id = created.body.id as number;

    const promoted = await request(t.http)
      .patch(`/api/users/${id}`)
      .set(bearer(admin))
      .send({ role: 'analyst', displayName: 'Promoted Person' })
      .expect(200);
    expect(promoted.body).toMatchObject({ role: 'analyst', displayName: 'Promoted Person' });

    const disabled = await request(t.http)
      .patch(`/api/users/${id}`)
      .set(bearer(admin))
      .send({ disabled: true })
      .expect(200);
    expect(disabled.body.disabled).toBe(true);

    const rows = audit(`user:${id}`);
    expect(rows.map((r) => r.action)).toEqual(['user.create', 'user.update', 'user.update']);
    expect(JSON.parse(rows[1].detail)).toEqual({
      changes: {
        role: { from: 'operator', to: 'analyst' },
        displayName: { from: 'promote', to: 'Promoted Person' },
      },
    });
    expect(JSON.parse(rows[2].detail)).toEqual({
      changes: { disabled: { from: false, to: true } },
    });
  });

  it('does not let an admin disable or demote themselves (409 with a reason)', async () => {
    const off = await request(t.http)
      .patch(`/api/users/${adminId}`)
      .set(bearer(admin))
      .send({ disabled: true })
      .expect(409);
    expect(off.body).toEqual({
      statusCode: 409,
      error: 'Conflict',
      message: 'You cannot disable your own account',
    });
    const demote = await request(t.http)
      .patch(`/api/users/${adminId}`)
      .set(bearer(admin))
      .send({ role: 'operator' })
      .expect(409);
    expect(demote.body.message).toBe('You cannot change your own role');
    expect(audit(`user:${adminId}`).filter((r) => r.action === 'user.update')).toHaveLength(0);
  });

  it('answers 404 for an unknown id and 400 for a non-numeric one', async () => {
    const missing = await request(t.http)
      .patch('/api/users/99999')
      .set(bearer(admin))
      .send({ role: 'analyst' })
      .expect(404);
    expect(missing.body).toEqual({
      statusCode: 404,
      error: 'Not Found',
      message: 'User 99999 not found',
    });
    const bad = await request(t.http)
      .patch('/api/users/abc')
      .set(bearer(admin))
      .send({ role: 'analyst' })
      .expect(400);
    expect(bad.body.fields).toEqual({ id: 'must be an integer' });
  });
});
