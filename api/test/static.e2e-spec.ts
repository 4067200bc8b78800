import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bootApp, type TestApp } from './helpers.js';

describe('built client with SPA fallback', () => {
  let t: TestApp;
  let dist: string;
  const INDEX = '<!doctype html><html><body><div id="root">fake client</div></body></html>';
  beforeAll(async () => {
    dist = mkdtempSync(join(tmpdir(), 'hopwise-dist-'));
    mkdirSync(join(dist, 'assets'));
    writeFileSync(join(dist, 'index.html'), INDEX);
    writeFileSync(join(dist, 'assets', 'main-abc123.js'), 'console.log(1);');
    t = await bootApp({ HOPWISE_APP_DIST: dist });
  });
  afterAll(async () => {
    await t.close();
    rmSync(dist, { recursive: true, force: true });
  });

  it('serves index.html at /', async () => {
    const res = await request(t.http).get('/').expect(200);
    expect(res.text).toBe(INDEX);
  });

  it('serves index.html for a client route like /map when HTML is accepted', async () => {
    const res = await request(t.http).get('/map').set('Accept', 'text/html').expect(200);
    expect(res.headers['content-type']).toMatch(/text\/html/);
    expect(res.text).toBe(INDEX);
  });

  it('serves index.html for a client route asked for with Accept */* (curl, scripts)', async () => {
    const res = await request(t.http).get('/links/3').set('Accept', '*/*').expect(200);
    expect(res.text).toBe(INDEX);
  });

  it('does not answer a JSON-only request for a client route with index.html', async () => {
    await request(t.http).get('/map').set('Accept', 'application/json').expect(404);
  });

  it('serves hashed assets with a long cache lifetime', async () => {
    const res = await request(t.http).get('/assets/main-abc123.js').expect(200);
    expect(res.headers['cache-control']).toContain('immutable');
  });

  it('keeps /api/* unknown routes as 404 JSON, even when HTML is accepted', async () => {
    const res = await request(t.http).get('/api/nope').set('Accept', 'text/html').expect(404);
    expect(res.body).toEqual({
      statusCode: 404,
      error: 'Not Found',
      message: 'Cannot GET /api/nope',
    });
  });

  it('does not answer a missing asset with index.html', async () => {
    await request(t.http).get('/assets/missing.js').set('Accept', 'text/html').expect(404);
  });
});
