import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createAdmin } from '../src/cli/create-admin.js';
import { bearer, bootApp, login } from './helpers.js';

/** The first admin of a database started without demo data (npm run create-admin). */
describe('create-admin', () => {
  const dir = mkdtempSync(join(tmpdir(), 'hopwise-admin-'));
  const dbFile = join(dir, 'hopwise.sqlite');
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  const users = () => {
    const db = new Database(dbFile, { readonly: true });
    try {
      return db.prepare('select email, role, disabled from users').all();
    } finally {
      db.close();
    }
  };

  it('refuses a bad e-mail or a weak password, naming the field, and writes nothing', async () => {
    await expect(
      createAdmin({ dbFile, email: 'not-an-address', password: 'long enough pass 1' }),
    ).rejects.toThrow(/^email/);
    await expect(
      createAdmin({ dbFile, email: 'ops@example.org', password: 'short' }),
    ).rejects.toThrow(/^password/);
    expect(existsSync(dbFile)).toBe(false); // refused before the database is even opened
  });

  it('creates an admin who can sign in and manage users, with an audit row', async () => {
    const created = await createAdmin({
      dbFile,
      email: 'Ops@Example.org',
      password: 'a long site password',
      displayName: 'Site operations',
    });
    expect(created.email).toBe('ops@example.org');
    expect(users()).toEqual([{ email: 'ops@example.org', role: 'admin', disabled: 0 }]);
    await expect(
      createAdmin({ dbFile, email: 'ops@example.org', password: 'another long password' }),
    ).rejects.toThrow(/^email: a user with ops@example.org already exists/);

    const t = await bootApp({ HOPWISE_DB_FILE: dbFile, HOPWISE_DEMO: '0' });
    try {
      const token = await login(t.http, 'ops@example.org', 'a long site password');
      const list = await request(t.http).get('/api/users').set(bearer(token)).expect(200);
      expect(list.body.total).toBe(1);
      expect(list.body.items[0]).toMatchObject({ email: 'ops@example.org', role: 'admin' });
      const audit = await request(t.http).get('/api/audit').set(bearer(token)).expect(200);
      expect(JSON.stringify(audit.body)).toContain('"via":"cli"');
    } finally {
      await t.close();
    }
  });
});
